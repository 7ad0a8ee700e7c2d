import { Link, type Href } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';

import { stationMessages, stationPower } from '@/shared/domain/workshop';
import { bandsFor } from '@/shared/domain';
import { regionLabels, type Station, type Unit } from '@/shared/schemas';

import { Button } from '../ui/button';
import { Text } from '../ui/text';
import { space } from '../ui/theme';
import { DownloadLink } from './download-link';
import { FormSection } from '../form/form-section';
import { MessagePlan } from './message-plan';
import { PowerChain } from './power-chain';

export type StationWorkshopProps = {
  station: Station;
  /** the assigned unit once loaded; null = none assigned */
  unit: Unit | null;
  unitLoading?: boolean;
  unitError?: string;
  readOnly?: boolean;
  onOpenBands: () => void;
  onOpenCalibration: () => void;
  onOpenOnAir: () => void;
};

/** The station's hardware, power, messages and bands, with the ways into the workshop screens. */
export function StationWorkshop({
  station,
  unit,
  unitLoading,
  unitError,
  readOnly,
  onOpenBands,
  onOpenCalibration,
  onOpenOnAir,
}: StationWorkshopProps) {
  const regionBands = bandsFor(station.region);
  const names = new Map(regionBands.map((band) => [band.id as string, band.name]));
  const order = regionBands.map((band) => band.id as string);
  const enabled = station.bands.filter((b) => b.enabled).sort((a, b) => order.indexOf(a.bandId) - order.indexOf(b.bandId));
  const unitHref: Href | null = unit ? { pathname: '/units/[id]', params: { id: String(unit.id) } } : null;
  return (
    <View style={styles.wrap}>
      <FormSection title="On the air">
        <Fact label="Unit">
          {station.unitId === null ? (
            <Text tone="danger">No unit assigned: edit the station to pick its hardware.</Text>
          ) : unitLoading ? (
            <Text tone="muted">Loading…</Text>
          ) : unitError ? (
            <Text tone="danger">{unitError}</Text>
          ) : unitHref && unit ? (
            <Link href={unitHref} asChild>
              <Pressable accessibilityRole="link" hitSlop={6}>
                <Text variant="label" tone="primary" style={styles.underline}>
                  {unit.name}
                </Text>
              </Pressable>
            </Link>
          ) : null}
        </Fact>
        <Fact label="Licence region">
          <Text>{regionLabels[station.region]}</Text>
        </Fact>
        <Fact label="Audio offset">
          <Text variant="mono">{station.audioOffsetHz} Hz</Text>
        </Fact>
        <Fact label="Transmit">
          <Text tone={station.transmitEnabled ? 'primary' : 'muted'} variant="label">
            {station.transmitEnabled ? 'Enabled' : 'Off'}
          </Text>
        </Fact>
        <Fact label="Bands">
          <Text>{enabled.length ? enabled.map((b) => names.get(b.bandId) ?? b.bandId).join(', ') : 'None enabled yet'}</Text>
        </Fact>
        <Fact label="Reference error">
          <Text variant="mono">{station.referenceErrorPpm === null ? 'not measured' : `${station.referenceErrorPpm.toFixed(3)} ppm`}</Text>
        </Fact>
        <View style={styles.actions}>
          <Button label="Bands and calibration" onPress={onOpenBands} />
          {readOnly ? null : <Button label="Calibrate" variant="secondary" onPress={onOpenCalibration} />}
          <Button label="On-air detail" variant="secondary" onPress={onOpenOnAir} disabled={!unit || enabled.length === 0} />
          <DownloadLink href={`/api/stations/${station.id}/config?download`} label="Download configuration" />
        </View>
      </FormSection>
      {unit ? (
        <FormSection title="Reported power" description="From the unit’s chain: the level the message reports, with the arithmetic.">
          <PowerChain power={stationPower(unit)} />
        </FormSection>
      ) : null}
      <FormSection title="Message plan" description="The exact texts the beacon sends.">
        <MessagePlan plan={stationMessages(station, unit)} />
      </FormSection>
    </View>
  );
}

function Fact({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <View style={styles.fact}>
      <Text variant="label" tone="muted" style={styles.factLabel}>
        {label}
      </Text>
      <View style={styles.factValue}>{children}</View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  fact: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.md, rowGap: 2, paddingVertical: 2, alignItems: 'baseline' },
  factLabel: { width: 128 },
  factValue: { flex: 1, minWidth: 160 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, marginTop: space.sm },
  underline: { textDecorationLine: 'underline' },
});

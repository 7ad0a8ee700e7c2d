import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';

import { bandsFor, type BandId } from '@/shared/domain';
import { bandOnAir, filterCoverage, type BandOnAir } from '@/shared/domain/workshop';
import type { Station, Unit } from '@/shared/schemas';

import { Card } from '../ui/card';
import { Notice } from '../ui/notice';
import { Text } from '../ui/text';
import { space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { formatMHz, formatSigned } from '../ui/format';
import { Switch } from '../ui/switch';
import { TextLink } from '../ui/text-link';
import { WindowGauge } from './window-gauge';
import { TermInfo } from '../help/term-info';
import { Heading } from '../ui/heading';

export type BandListProps = {
  station: Station;
  unit: Unit | null;
  readOnly?: boolean;
  /** the band whose switch is being saved */
  pendingBandId?: BandId | null;
  /** the server's refusal, per band, in words */
  errors?: Partial<Record<BandId, string>>;
  onToggle: (bandId: BandId, enabled: boolean) => void;
};

/** Every band of the station's licence region: its switch, why it cannot be enabled, and its window gauge. */
export function BandList({ station, unit, readOnly, pendingBandId, errors = {}, onToggle }: BandListProps) {
  const { colors } = useAppTheme();
  const rows = bandsFor(station.region).map((band) => {
    const setting = station.bands.find((b) => b.bandId === band.id);
    const coverage = unit ? filterCoverage(unit.filters, band) : null;
    const blocked = !unit ? NO_UNIT : coverage && !coverage.covered ? coverage.reason : null;
    return { band, setting, enabled: setting?.enabled ?? false, blocked };
  });
  const usable = rows.filter((row) => row.enabled || !row.blocked);
  const closed = rows.filter((row) => !row.enabled && row.blocked);
  return (
    <View style={styles.list}>
      {!unit ? <Notice message={NO_UNIT} /> : null}
      {unit && usable.length === 0 ? (
        <Notice
          tone="info"
          message="No filter on this unit covers a band of this licence region. Add the right low-pass filter to the unit first."
        />
      ) : null}
      {usable.map(({ band, setting, enabled, blocked }) => {
        const air = unit && enabled ? bandOnAir(station, unit, band.id) : null;
        const onAir = air && !('problem' in air) ? (air as BandOnAir) : null;
        const offset = setting?.calibrationOffsetHz;
        return (
          <Card key={band.id} style={styles.card}>
            <View style={styles.head}>
              <Text variant="heading">{band.name}</Text>
              <View style={styles.dial}>
                <Text variant="mono" tone="muted">
                  dial {formatMHz(band.dialHz)}
                </Text>
                <TermInfo term="dial" />
              </View>
            </View>
            <Switch
              label={enabled ? `${band.name} is enabled` : `${band.name} is off`}
              accessibilityLabel={`Enable ${band.name}`}
              value={enabled}
              // a band that is on can always be switched off, even when its filter went away
              disabled={readOnly}
              busy={pendingBandId === band.id}
              hint={
                enabled
                  ? offset == null
                    ? 'Not calibrated yet.'
                    : `Calibration: ${formatSigned(offset, 2, 'Hz')} (${setting?.calibrationSource === 'typed' ? 'typed' : setting?.calibrationSource === 'reports' ? 'from reports' : 'measured'}).`
                  : 'Off: the beacon skips this band. A filter on the unit covers it.'
              }
              onChange={(next) => onToggle(band.id, next)}
            />
            {errors[band.id] ? (
              <Text variant="label" tone="danger" accessibilityRole="alert">
                {errors[band.id]}
              </Text>
            ) : null}
            {enabled && blocked ? (
              <>
                <Text variant="label" tone="danger">
                  {blocked} The beacon will not transmit here.
                </Text>
                {unit && !readOnly ? <UnitFiltersLink unitId={unit.id} /> : null}
              </>
            ) : null}
            {onAir ? (
              <>
                <WindowGauge
                  bandName={band.name}
                  dialHz={band.dialHz}
                  window={onAir.window}
                  toleranceHz={onAir.toleranceHz}
                  warmUpDriftHz={onAir.warmUpDriftHz}
                  driftedWindow={onAir.driftedWindow}
                  calibrated={onAir.calibrated}
                />
                <Link href={{ pathname: '/stations/[id]/on-air', params: { id: String(station.id), band: band.id } }} asChild>
                  <Pressable accessibilityRole="link" accessibilityLabel={`On-air detail for ${band.name}`} hitSlop={6} style={styles.link}>
                    <Text variant="label" tone="primary" style={styles.underline}>
                      On-air detail for {band.name}
                    </Text>
                  </Pressable>
                </Link>
              </>
            ) : null}
          </Card>
        );
      })}
      {closed.length ? (
        <Card style={styles.card}>
          <Heading level={2}>{unit ? 'Bands no filter covers' : 'Bands'}</Heading>
          {unit ? <Text tone="muted">These stay off until the unit has a low-pass filter made for them.</Text> : null}
          {unit && !readOnly ? <UnitFiltersLink unitId={unit.id} /> : null}
          {closed.map(({ band, blocked }) => (
            <View key={band.id} style={[styles.closedRow, { borderColor: colors.border }]}>
              <Switch
                label={`${band.name} · ${formatMHz(band.dialHz)}`}
                accessibilityLabel={`Enable ${band.name}`}
                value={false}
                disabled
                hint={unit ? (blocked ?? undefined) : undefined}
                onChange={() => undefined}
              />
              {errors[band.id] ? (
                <Text variant="label" tone="danger" accessibilityRole="alert">
                  {errors[band.id]}
                </Text>
              ) : null}
            </View>
          ))}
        </Card>
      ) : null}
    </View>
  );
}

/** From a band a filter cannot serve to the unit's form, where the filters are changed. */
function UnitFiltersLink({ unitId }: { unitId: number }) {
  return <TextLink href={{ pathname: '/units/[id]/edit', params: { id: String(unitId) } }} label="Change the unit’s filters" />;
}

const NO_UNIT = 'Assign a unit to this station first: the unit’s filters decide which bands can be enabled.';

const styles = StyleSheet.create({
  list: { gap: space.md },
  card: { gap: space.md },
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'baseline', justifyContent: 'space-between', columnGap: space.md },
  link: { alignSelf: 'flex-start' },
  dial: { flexDirection: 'row', alignItems: 'center' },
  underline: { textDecorationLine: 'underline' },
  closedRow: { borderTopWidth: 1, paddingTop: space.xs },
});

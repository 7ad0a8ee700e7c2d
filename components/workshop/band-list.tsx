import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';

import { bandsFor, type BandId } from '@/shared/domain';
import { bandOnAir, filterCoverage, type BandOnAir } from '@/shared/domain/workshop';
import type { Station, Unit } from '@/shared/schemas';

import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { space } from '../ui/theme';
import { formatMHz, formatSigned } from './format';
import { Toggle } from './toggle';
import { WindowGauge } from './window-gauge';

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
  const bands = bandsFor(station.region);
  return (
    <View style={styles.list}>
      {bands.map((band) => {
        const setting = station.bands.find((b) => b.bandId === band.id);
        const enabled = setting?.enabled ?? false;
        const coverage = unit ? filterCoverage(unit.filters, band) : null;
        const air = unit && enabled ? bandOnAir(station, unit, band.id) : null;
        const onAir = air && !('problem' in air) ? (air as BandOnAir) : null;
        const blocked = !unit ? 'Assign a unit to this station first: the unit’s filters decide which bands can be enabled.' : coverage && !coverage.covered ? coverage.reason : null;
        const offset = setting?.calibrationOffsetHz;
        return (
          <Card key={band.id} style={styles.card}>
            <View style={styles.head}>
              <Text variant="heading">{band.name}</Text>
              <Text variant="mono" tone="muted">
                dial {formatMHz(band.dialHz)}
              </Text>
            </View>
            <Toggle
              label={enabled ? `${band.name} is enabled` : `${band.name} is off`}
              accessibilityLabel={`Enable ${band.name}`}
              value={enabled}
              // a band that is on can always be switched off, even when its filter went away
              disabled={readOnly || (!enabled && !!blocked)}
              busy={pendingBandId === band.id}
              hint={
                blocked && !enabled
                  ? blocked
                  : enabled
                    ? offset == null
                      ? 'Not calibrated yet.'
                      : `Calibration: ${formatSigned(offset, 2, 'Hz')} (${setting?.calibrationSource === 'typed' ? 'typed' : 'measured'}).`
                    : 'Off: the beacon skips this band.'
              }
              onChange={(next) => onToggle(band.id, next)}
            />
            {errors[band.id] ? (
              <Text variant="label" tone="danger" accessibilityRole="alert">
                {errors[band.id]}
              </Text>
            ) : null}
            {enabled && blocked ? (
              <Text variant="label" tone="danger">
                {blocked} The beacon will not transmit here.
              </Text>
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
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.md },
  card: { gap: space.md },
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'baseline', justifyContent: 'space-between', columnGap: space.md },
  link: { alignSelf: 'flex-start' },
  underline: { textDecorationLine: 'underline' },
});

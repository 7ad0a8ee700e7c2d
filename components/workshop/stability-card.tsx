import { StyleSheet, View } from 'react-native';

import { bandFor, type BandId, type LicenceRegion } from '@/shared/domain';

import { useConfirmedMutation } from '../query/use-confirmed-mutation';
import { useUpdateUnitMutation } from '../units/queries';
import { Button } from '../ui/button';
import { ConfirmDialog } from '../ui/confirm-dialog';
import { formatSigned, formatUtcDateTime } from '../ui/format';
import { ErrorState, LoadingState } from '../ui/query-states';
import { Heading } from '../ui/heading';
import { Text } from '../ui/text';
import { radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { useStabilityQuery } from './queries';

/** The newest transmissions shown in the list (the verdict uses all of them). */
const SHOWN = 12;

/**
 * Stability from reports: the verdict in words, the newest transmissions (UTC) with their heard error, drift and the
 * unit's temperature, and the estimated temperature coefficient, which the owner may save to the unit after confirming.
 */
export function StabilityCard({ stationId, region, readOnly }: { stationId: number; region: LicenceRegion; readOnly: boolean }) {
  const { colors } = useAppTheme();
  const query = useStabilityQuery(stationId);
  const unitId = query.data?.unitId ?? 0;
  const save = useConfirmedMutation(useUpdateUnitMutation(unitId));
  if (query.isPending) return <LoadingState label="Reading the stability…" />;
  if (query.isError) return <ErrorState title="The stability could not be read" error={query.error} onRetry={() => query.refetch()} />;
  const data = query.data;
  const found = bandFor(data.bandId as BandId, region);
  const name = found.ok ? found.band.name : data.bandId;
  const verdict = data.verdict;
  const newest = data.points.slice(-SHOWN).reverse();
  const withTemperature = newest.some((p) => p.temperatureC !== null);
  return (
    <View style={[styles.card, { borderColor: colors.border }]}>
      <Heading level={2}>Stability on {name}</Heading>
      <Text>Verdict: {verdict.words}.</Text>
      {verdict.tempCoPpmPerC !== null ? (
        <Text tone="muted">
          That is about {verdict.tempCoPpmPerC.toFixed(3)} ppm per °C; the unit states{' '}
          {data.unitTempCoPpmPerC === null ? 'no coefficient' : `${data.unitTempCoPpmPerC} ppm per °C`}.
        </Text>
      ) : null}
      {newest.length ? (
        <View accessibilityLabel="Newest transmissions heard" style={styles.rows}>
          <Text variant="caption" tone="muted">
            {withTemperature
              ? 'Newest transmissions (month-day, UTC): heard error · drift · unit temperature'
              : 'Newest transmissions (month-day, UTC): heard error · drift. The device sent no temperatures for them.'}
          </Text>
          {newest.map((p) => (
            <Text key={p.slotStartMs}>
              {formatUtcDateTime(new Date(p.slotStartMs).toISOString()).slice(5)} · {formatSigned(p.medianErrorHz, 1, 'Hz')} ·{' '}
              {formatSigned(p.medianDriftHz, 0, 'Hz')}
              {withTemperature ? ` · ${p.temperatureC === null ? 'no temperature' : `${p.temperatureC.toFixed(1)} °C`}` : ''}
            </Text>
          ))}
        </View>
      ) : null}
      {!readOnly && data.unitId !== null && verdict.tempCoPpmPerC !== null ? (
        <Button label="Save the coefficient to the unit" variant="secondary" onPress={() => save.ask()} style={styles.save} />
      ) : null}
      <ConfirmDialog
        {...save.dialog}
        title="Save the temperature coefficient?"
        message={`The unit’s coefficient becomes ${verdict.tempCoPpmPerC?.toFixed(3) ?? '–'} ppm per °C. Warm-up warnings on every station using this unit follow it.`}
        confirmLabel="Save coefficient"
        onConfirm={() =>
          verdict.tempCoPpmPerC !== null && save.confirm({ tempCoPpmPerC: verdict.tempCoPpmPerC }, () => void query.refetch())
        }
      />
    </View>
  );
}

const styles = StyleSheet.create({
  card: { borderWidth: 1, borderRadius: radius.lg, padding: space.lg, gap: space.sm },
  rows: { gap: 2 },
  save: { alignSelf: 'flex-start' },
});

import { StyleSheet, View } from 'react-native';

import type { Reach } from '@/shared/api/receptions';

import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { space } from '../ui/theme';
import { formatCount, formatDb, formatKm, formatShare } from './format';

export type Figure = { label: string; value: string; note?: string };

export function reachFigures(reach: Reach): Figure[] {
  return [
    { label: 'Reports', value: formatCount(reach.reports) },
    { label: 'Receivers', value: formatCount(reach.receivers), note: 'distinct listening stations' },
    {
      label: 'Transmissions heard',
      value: formatShare(reach.heardShare),
      note:
        reach.heardShare == null
          ? 'no plan covers this period'
          : `${formatCount(reach.heardTransmissions)} of ${formatCount(reach.plannedTransmissions)} planned`,
    },
    { label: 'Furthest receiver', value: formatKm(reach.furthestKm) },
    { label: 'Median distance', value: formatKm(reach.medianKm) },
    { label: 'Best SNR', value: formatDb(reach.bestSnrDb), note: `${formatDb(reach.bestSnrPerWattDb)} referred to 1 W` },
    {
      label: 'Distance per watt',
      value: reach.kmPerWatt == null ? '—' : `${formatCount(Math.round(reach.kmPerWatt))} km/W`,
      note: 'furthest receiver ÷ power',
    },
  ];
}

/** The period's figures as small cards that wrap: two to a row on a phone, more when there is room. */
export function ReachFigures({ reach }: { reach: Reach }) {
  return <FigureGrid label="Figures for this period" figures={reachFigures(reach)} />;
}

/** Labelled figures as small wrapping cards (the results, a comparison, a club's reach). */
export function FigureGrid({ label, figures }: { label: string; figures: Figure[] }) {
  return (
    <View style={styles.grid} accessibilityLabel={label}>
      {figures.map((figure) => (
        <Card key={figure.label} style={styles.card}>
          <Text variant="caption" tone="muted">
            {figure.label}
          </Text>
          <Text variant="monoLarge" accessibilityLabel={`${figure.label}: ${figure.value}`}>
            {figure.value}
          </Text>
          {figure.note ? (
            <Text variant="caption" tone="muted">
              {figure.note}
            </Text>
          ) : null}
        </Card>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  card: { flexGrow: 1, flexBasis: 150, minWidth: 140, padding: space.md, gap: 2 },
});

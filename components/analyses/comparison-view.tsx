import { StyleSheet, View } from 'react-native';

import type { Comparison, ComparisonSide } from '@/shared/api/analyses';

import { bandName } from '../receptions/format';
import { FigureGrid } from '../receptions/reach-figures';
import { Card } from '../ui/card';
import { formatSigned, formatUtcDateTime } from '../ui/format';
import { Heading } from '../ui/heading';
import { Text } from '../ui/text';
import { space } from '../ui/theme';
import { barSpanDb, DeltaTable } from './delta-table';
import { OneSideList } from './one-side-list';

const dB = (value: number) => formatSigned(value, 1, 'dB');

function SideLine({ letter, side }: { letter: 'A' | 'B'; side: ComparisonSide }) {
  return (
    <Text>
      <Text variant="label">{letter}: </Text>
      {side.name} (<Text variant="mono">{side.callsign}</Text>, {side.locator}), {formatUtcDateTime(side.from)} to{' '}
      {formatUtcDateTime(side.to)}
    </Text>
  );
}

/** The comparison's answer: verdict, figures, by direction and distance, and who heard one side only. */
export function ComparisonView({ comparison }: { comparison: Comparison }) {
  const c = comparison;
  const spanDb = barSpanDb([...c.bySector, ...c.byDistance]);
  const figures = [
    { label: 'B − A per watt (median)', value: c.medianDeltaDb === null ? 'too few' : dB(c.medianDeltaDb) },
    { label: '95 % interval', value: c.ci95 ? `${dB(c.ci95[0])} to ${dB(c.ci95[1])}` : '—' },
    { label: 'Common receivers', value: String(c.commonReceivers) },
    { label: 'Common reports', value: String(c.commonReports), note: `${c.pairs} receiver-hours heard both` },
  ];
  return (
    <View style={styles.root}>
      <Card tone="primary" style={styles.verdict}>
        <Heading level={2}>Verdict on {bandName(c.bandId)}</Heading>
        <Text accessibilityLabel={`Verdict: ${c.verdict}`} testID="comparison-verdict">
          {c.verdict}
        </Text>
        <SideLine letter="A" side={c.a} />
        <SideLine letter="B" side={c.b} />
      </Card>
      <FigureGrid label="Comparison figures" figures={figures} />
      <Card>
        <DeltaTable title="By direction from A" firstColumn="Towards the" groups={c.bySector} spanDb={spanDb} />
      </Card>
      <Card>
        <DeltaTable title="By distance" firstColumn="Distance" groups={c.byDistance} spanDb={spanDb} />
      </Card>
      <View style={styles.sides}>
        <OneSideList title={`Heard A only (${c.a.callsign})`} receivers={c.onlyA} more={c.onlyAMore} />
        <OneSideList title={`Heard B only (${c.b.callsign})`} receivers={c.onlyB} more={c.onlyBMore} />
      </View>
      <Text variant="caption" tone="muted">
        How this is worked out: only reports of the same receiver{' '}
        {c.mode === 'same-time' ? 'within the same UTC hour' : 'at the same UTC hour of day'} are compared, each SNR referred to 1 W (SNR −
        (power in dBm − 30)). Each receiver-hour heard by both gives one difference B − A; the median difference is the Hodges–Lehmann
        estimate and the interval the Wilcoxon signed-rank 95 % interval. Groups with fewer than 10 receiver-hours say “too few to say”.
        {c.withoutPower > 0 ? ` ${c.withoutPower} reports without a power were left out.` : ''}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: space.lg },
  verdict: { gap: space.sm },
  sides: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
});

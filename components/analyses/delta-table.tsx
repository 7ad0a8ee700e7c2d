import { StyleSheet, View } from 'react-native';

import type { GroupFigures } from '@/shared/domain/reception/comparison';

import { formatSigned } from '../ui/format';
import { Heading } from '../ui/heading';
import { Text } from '../ui/text';
import { space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';

const dB = (value: number) => formatSigned(value, 1, 'dB');

/** "+3.1 dB (+2.4 to +3.8 dB)" or the reason there is no number. */
export function groupWords(group: GroupFigures): string {
  if (group.pairs === 0) return 'not heard by both';
  if (!group.enough || group.medianDeltaDb === null) return 'too few to say';
  const interval = group.ci95 ? ` (${dB(group.ci95[0])} to ${dB(group.ci95[1])})` : '';
  return `${dB(group.medianDeltaDb)}${interval}`;
}

/** The interval on a shared scale around 0, the estimate as a tick; drawn only for groups with enough pairs. */
function DeltaBar({ group, spanDb }: { group: GroupFigures; spanDb: number }) {
  const { colors } = useAppTheme();
  if (!group.enough || group.medianDeltaDb === null || !group.ci95) return <View style={styles.bar} />;
  const at = (db: number) => `${Math.max(0, Math.min(100, 50 + (db / spanDb) * 50))}%` as const;
  const low = Math.max(0, Math.min(100, 50 + (group.ci95[0] / spanDb) * 50));
  const high = Math.max(0, Math.min(100, 50 + (group.ci95[1] / spanDb) * 50));
  return (
    <View style={styles.bar} aria-hidden>
      <View style={[styles.track, { backgroundColor: colors.primarySoft }]} />
      <View style={[styles.zero, { backgroundColor: colors.textMuted }]} />
      <View style={[styles.interval, { left: `${low}%`, width: `${Math.max(1, high - low)}%`, backgroundColor: colors.primary }]} />
      <View style={[styles.estimate, { left: at(group.medianDeltaDb), backgroundColor: colors.signal }]} />
    </View>
  );
}

export type DeltaTableProps = { title: string; groups: GroupFigures[]; firstColumn: string; spanDb: number };

/** One scale for every bar of a comparison: whole dB, at least ±3 dB, with room beyond the widest interval. */
export function barSpanDb(groups: GroupFigures[]): number {
  const widest = Math.max(0, ...groups.flatMap((g) => (g.enough && g.ci95 ? g.ci95.map(Math.abs) : [])));
  return Math.max(3, Math.ceil(widest + 0.5));
}

/** B − A per group (direction or distance): pairs, the estimate with its interval, and a bar around 0. */
export function DeltaTable({ title, groups, firstColumn, spanDb }: DeltaTableProps) {
  const { colors } = useAppTheme();
  return (
    <View style={styles.root}>
      <Heading level={2}>{title}</Heading>
      <View style={[styles.row, { borderColor: colors.border }]}>
        {[firstColumn, 'Paired', 'B − A per watt (95 % interval)'].map((heading, i) => (
          <Text key={heading} variant="caption" tone="muted" style={i === 2 ? styles.wide : styles.cell}>
            {heading}
          </Text>
        ))}
      </View>
      {groups.map((group) => (
        <View
          key={group.key}
          style={[styles.row, { borderColor: colors.border }]}
          accessibilityLabel={`${group.words}: ${group.pairs} paired receiver-hours, ${groupWords(group)}`}
        >
          <Text style={styles.cell}>{group.words}</Text>
          <Text variant="mono" style={styles.cell}>
            {group.pairs}
          </Text>
          <View style={[styles.wide, styles.deltaCell]}>
            <Text variant="mono" tone={group.enough ? 'default' : 'muted'}>
              {groupWords(group)}
            </Text>
            <DeltaBar group={group} spanDb={spanDb} />
          </View>
        </View>
      ))}
      <Text variant="caption" tone="muted">
        The bar runs from −{spanDb} dB to +{spanDb} dB; the line marks 0, the block the 95 % interval, the tick the median difference.
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: space.sm },
  row: { flexDirection: 'row', borderBottomWidth: 1, paddingVertical: space.sm, gap: space.sm, alignItems: 'center' },
  cell: { flex: 1, minWidth: 0 },
  wide: { flex: 3, minWidth: 0 },
  deltaCell: { gap: 4 },
  bar: { height: 12, position: 'relative' },
  track: { position: 'absolute', left: 0, right: 0, top: 5, height: 2 },
  zero: { position: 'absolute', left: '50%', top: 0, width: 1, height: 12 },
  interval: { position: 'absolute', top: 3, height: 6, borderRadius: 3 },
  estimate: { position: 'absolute', top: 0, width: 3, height: 12, marginLeft: -1 },
});

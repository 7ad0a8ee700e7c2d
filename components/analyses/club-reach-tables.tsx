import { StyleSheet, View } from 'react-native';

import type { ClubPostHeard, ClubStationReach } from '@/shared/api/analyses';

import { bandName, formatCount, formatKm } from '../receptions/format';
import { Text } from '../ui/text';
import { space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';

type Column<T> = { title: string; cell: (row: T) => string; mono?: boolean; wide?: boolean };

/** A table of rows on a wide screen; on a phone each row is a small block (name first, then "title value" pairs that wrap). */
function SimpleTable<T>({
  rows,
  columns,
  keyOf,
  rowLabel,
  wide,
}: {
  rows: T[];
  columns: Column<T>[];
  keyOf: (row: T) => string;
  rowLabel: (row: T) => string;
  wide: boolean;
}) {
  const { colors } = useAppTheme();
  if (!wide) {
    const [first, ...rest] = columns;
    return (
      <View>
        {rows.map((row) => (
          <View key={keyOf(row)} style={[styles.block, { borderColor: colors.border }]} accessibilityLabel={rowLabel(row)}>
            <Text variant="label">{first.cell(row)}</Text>
            <View style={styles.pairs}>
              {rest.map((c) => (
                <Text key={c.title} tone="muted">
                  {c.title} <Text variant={c.mono ? 'mono' : 'body'}>{c.cell(row)}</Text>
                </Text>
              ))}
            </View>
          </View>
        ))}
      </View>
    );
  }
  return (
    <View>
      <View style={[styles.row, { borderColor: colors.border }]}>
        {columns.map((c) => (
          <Text key={c.title} variant="caption" tone="muted" style={c.wide ? styles.wide : styles.cell}>
            {c.title}
          </Text>
        ))}
      </View>
      {rows.map((row) => (
        <View key={keyOf(row)} style={[styles.row, { borderColor: colors.border }]} accessibilityLabel={rowLabel(row)}>
          {columns.map((c) => (
            <Text key={c.title} variant={c.mono ? 'mono' : 'body'} style={c.wide ? styles.wide : styles.cell}>
              {c.cell(row)}
            </Text>
          ))}
        </View>
      ))}
    </View>
  );
}

export function ClubStationsTable({ stations, wide }: { stations: ClubStationReach[]; wide: boolean }) {
  return (
    <SimpleTable
      wide={wide}
      rows={stations}
      keyOf={(s) => String(s.stationId)}
      rowLabel={(s) =>
        `${s.name}, ${s.callsign}, ${s.ownerName}: ${formatCount(s.reports)} reports, ${formatCount(s.receivers)} receivers, furthest ${formatKm(s.furthestKm)}`
      }
      columns={[
        { title: 'Station', cell: (s) => `${s.name} · ${s.callsign}`, wide: true },
        { title: 'Member', cell: (s) => s.ownerName },
        { title: 'Reports', cell: (s) => formatCount(s.reports), mono: true },
        { title: 'Receivers', cell: (s) => formatCount(s.receivers), mono: true },
        { title: 'Furthest', cell: (s) => formatKm(s.furthestKm), mono: true },
      ]}
    />
  );
}

export function ClubPostsTable({ posts, wide }: { posts: ClubPostHeard[]; wide: boolean }) {
  return (
    <SimpleTable
      wide={wide}
      rows={posts}
      keyOf={(p) => String(p.postId)}
      rowLabel={(p) =>
        `${p.name}, ${p.callsign}, ${p.ownerName}: ${formatCount(p.reports)} reports of ${p.transmitters} transmitters, furthest ${formatKm(p.furthestKm)}`
      }
      columns={[
        { title: 'Listening post', cell: (p) => `${p.name} · ${p.callsign}`, wide: true },
        { title: 'Member', cell: (p) => p.ownerName },
        { title: 'Reports heard', cell: (p) => formatCount(p.reports), mono: true },
        { title: 'Transmitters', cell: (p) => formatCount(p.transmitters), mono: true },
        { title: 'Furthest', cell: (p) => formatKm(p.furthestKm), mono: true },
        { title: 'Bands', cell: (p) => (p.bands.length ? p.bands.map(bandName).join(', ') : '—') },
      ]}
    />
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', borderBottomWidth: 1, paddingVertical: space.sm, gap: space.sm },
  cell: { flex: 1, minWidth: 0 },
  wide: { flex: 2, minWidth: 0 },
  block: { borderBottomWidth: 1, paddingVertical: space.sm, gap: 2 },
  pairs: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.md },
});

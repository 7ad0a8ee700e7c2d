import { Link, type Href } from 'expo-router';
import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';

import type { Station } from '@/shared/schemas';

import { Text } from '../ui/text';
import { formatLocator, formatUtcDateTime } from '../ui/format';
import { radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { List, ListItem } from '../ui/list';

export type StationListProps = {
  stations: Station[];
  /** Cards on phones, a table with columns on wide screens. */
  layout: 'cards' | 'table';
  /** Club view: show whose station it is. */
  showOwner?: boolean;
  /** Where a station opens; the operator's own detail screen by default. */
  hrefFor?: (station: Station) => Href;
  /** The operator's devices, by station id: true online, false offline; a station absent here has no device token. */
  deviceOnline?: ReadonlyMap<number, boolean>;
};

/** A station's state in a few words: on the air, paused or stopped by a club, and its device. */
export function stationState(
  station: Station,
  deviceOnline?: ReadonlyMap<number, boolean>,
): { words: string; tone: 'primary' | 'muted' | 'danger' } {
  const air = station.suspension
    ? { words: `Stopped by ${station.suspension.clubName ?? 'a club admin'}`, tone: 'danger' as const }
    : station.transmitEnabled
      ? { words: 'On the air', tone: 'primary' as const }
      : { words: 'Paused', tone: 'muted' as const };
  if (!deviceOnline) return air;
  const online = deviceOnline.get(station.id);
  return { ...air, words: `${air.words} · ${online === undefined ? 'no device yet' : online ? 'device online' : 'device offline'}` };
}

const ownDetail = (station: Station): Href => ({ pathname: '/stations/[id]', params: { id: String(station.id) } });

export function StationList({ stations, layout, showOwner = false, hrefFor = ownDetail, deviceOnline }: StationListProps) {
  return layout === 'table' ? (
    <StationTable stations={stations} showOwner={showOwner} hrefFor={hrefFor} deviceOnline={deviceOnline} />
  ) : (
    <View style={styles.cards}>
      {stations.map((station) => (
        <StationCard key={station.id} station={station} showOwner={showOwner} href={hrefFor(station)} deviceOnline={deviceOnline} />
      ))}
    </View>
  );
}

export type StationCardProps = { station: Station; href: Href; showOwner?: boolean; deviceOnline?: ReadonlyMap<number, boolean> };

export function StationCard({ station, href, showOwner = false, deviceOnline }: StationCardProps) {
  const { colors } = useAppTheme();
  const state = stationState(station, deviceOnline);
  return (
    <Link href={href} asChild>
      <Pressable
        accessibilityRole="link"
        // Link's asChild spreads the child's style into an object: pass one flat object
        style={StyleSheet.flatten([styles.card, { backgroundColor: colors.surface, borderColor: colors.border }])}
      >
        <View style={styles.cardTop}>
          <Text variant="heading" numberOfLines={1} style={styles.flex}>
            {station.name}
          </Text>
          <Text variant="mono" tone="primary">
            {station.callsign}
          </Text>
        </View>
        <Text variant="label" tone={state.tone}>
          {state.words}
        </Text>
        <View style={styles.cardMeta}>
          <Text variant="caption" tone="muted">
            Locator <Text variant="mono">{formatLocator(station.locator)}</Text>
          </Text>
          <Text variant="caption" tone="muted">
            Updated {formatUtcDateTime(station.updatedAt)}
          </Text>
        </View>
        {showOwner ? (
          <Text variant="caption" tone="muted">
            Operator: {station.ownerName}
          </Text>
        ) : null}
      </Pressable>
    </Link>
  );
}

type StationTableProps = {
  stations: Station[];
  showOwner: boolean;
  hrefFor: (station: Station) => Href;
  deviceOnline?: ReadonlyMap<number, boolean>;
};

function StationTable({ stations, showOwner, hrefFor, deviceOnline }: StationTableProps) {
  const { colors } = useAppTheme();
  const header = [
    { key: 'name', label: 'Name', style: styles.colName },
    ...(showOwner ? [{ key: 'owner', label: 'Operator', style: styles.colOwner }] : []),
    { key: 'callsign', label: 'Callsign', style: styles.colCall },
    { key: 'locator', label: 'Locator', style: styles.colLoc },
    { key: 'state', label: 'State', style: styles.colState },
    { key: 'updated', label: 'Updated (UTC)', style: styles.colUpdated },
  ];
  return (
    <List style={[styles.table, { borderColor: colors.border, backgroundColor: colors.surface }]}>
      <View style={[styles.row, styles.headRow, { borderColor: colors.border }]}>
        {header.map((column) => (
          <Text key={column.key} variant="caption" tone="muted" style={[column.style, styles.headCell]}>
            {column.label}
          </Text>
        ))}
      </View>
      {stations.map((station, index) => (
        <ListItem key={station.id}>
          <StationRow
            station={station}
            href={hrefFor(station)}
            showOwner={showOwner}
            last={index === stations.length - 1}
            state={stationState(station, deviceOnline)}
          />
        </ListItem>
      ))}
    </List>
  );
}

type StationRowProps = {
  station: Station;
  href: Href;
  showOwner: boolean;
  last: boolean;
  state: ReturnType<typeof stationState>;
};

function StationRow({ station, href, showOwner, last, state }: StationRowProps) {
  const { colors } = useAppTheme();
  const [hovered, setHovered] = useState(false);
  return (
    <Link href={href} asChild>
      <Pressable
        accessibilityRole="link"
        onHoverIn={() => setHovered(true)}
        onHoverOut={() => setHovered(false)}
        // Link's asChild spreads the child's style into an object: pass one flat object
        style={StyleSheet.flatten([
          styles.row,
          !last && { borderBottomWidth: 1, borderColor: colors.border },
          hovered && { backgroundColor: colors.primarySoft },
        ])}
      >
        <Text variant="label" numberOfLines={1} style={styles.colName}>
          {station.name}
        </Text>
        {showOwner ? (
          <Text numberOfLines={1} style={styles.colOwner}>
            {station.ownerName}
          </Text>
        ) : null}
        <Text variant="mono" tone="primary" style={styles.colCall}>
          {station.callsign}
        </Text>
        <Text variant="mono" style={styles.colLoc}>
          {formatLocator(station.locator)}
        </Text>
        <Text variant="caption" tone={state.tone} style={styles.colState}>
          {state.words}
        </Text>
        <Text variant="caption" tone="muted" style={styles.colUpdated}>
          {formatUtcDateTime(station.updatedAt).replace(' UTC', '')}
        </Text>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  flex: { flex: 1 },
  cards: { gap: space.md },
  card: { borderWidth: 1, borderRadius: radius.lg, padding: space.lg, gap: space.sm },
  cardTop: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  cardMeta: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.lg, rowGap: space.xs },
  table: { borderWidth: 1, borderRadius: radius.lg, overflow: 'hidden' },
  row: { flexDirection: 'row', alignItems: 'center', paddingHorizontal: space.lg, paddingVertical: space.md, gap: space.md },
  headRow: { borderBottomWidth: 1 },
  headCell: { textTransform: 'uppercase', letterSpacing: 0.6 },
  colName: { flex: 3 },
  colOwner: { flex: 2 },
  colCall: { flex: 2 },
  colLoc: { flex: 1.4 },
  colUpdated: { flex: 2.2 },
  colState: { flex: 2.6 },
});

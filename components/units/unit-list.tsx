import { Link, type Href } from 'expo-router';
import { useState } from 'react';
import { Image, Pressable, StyleSheet, View } from 'react-native';

import type { Unit } from '@/shared/schemas';

import { Text } from '../ui/text';
import { fonts, radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { bandName, filterBands, generatorSummary } from './unit-summary';
import { List, ListItem } from '../ui/list';

export type UnitListProps = {
  units: Unit[];
  layout: 'cards' | 'table';
  /** unit id → the names of the operator's stations on it */
  usedBy?: ReadonlyMap<number, string[]>;
};

const usedByWords = (unit: Unit, usedBy?: ReadonlyMap<number, string[]>) => {
  if (!usedBy) return null;
  const names = usedBy.get(unit.id) ?? [];
  return names.length ? `Used by ${names.join(', ')}` : 'No station uses it yet';
};

const detail = (unit: Unit): Href => ({ pathname: '/units/[id]', params: { id: String(unit.id) } });

/** The beacon hardware register: cards on phones, columns on wide screens. */
export function UnitList({ units, layout, usedBy }: UnitListProps) {
  if (layout === 'cards')
    return (
      <View style={styles.cards}>
        {units.map((unit) => (
          <UnitCard key={unit.id} unit={unit} usedBy={usedByWords(unit, usedBy)} />
        ))}
      </View>
    );
  return <UnitTable units={units} usedBy={usedBy} />;
}

function Thumb({ unit, size }: { unit: Unit; size: number }) {
  const { colors } = useAppTheme();
  const photo = unit.photos[0];
  return photo ? (
    <Image
      source={{ uri: photo.thumbUrl }}
      accessibilityLabel={`Photo of ${unit.name}`}
      style={{ width: size, height: size, borderRadius: radius.sm, backgroundColor: colors.border }}
    />
  ) : (
    <View
      accessibilityLabel="No photo"
      style={[styles.noPhoto, { width: size, height: size, borderColor: colors.border, backgroundColor: colors.background }]}
    >
      <Text variant="caption" tone="muted">
        —
      </Text>
    </View>
  );
}

function BandTags({ unit }: { unit: Unit }) {
  const { colors } = useAppTheme();
  const bands = filterBands(unit);
  if (!bands.length)
    return (
      <Text variant="caption" tone="danger">
        No filters
      </Text>
    );
  return (
    <View style={styles.tags}>
      {bands.map((id) => (
        <View key={id} style={[styles.tag, { backgroundColor: colors.primarySoft }]}>
          <Text variant="caption" tone="primary" style={styles.tagText}>
            {bandName(id)}
          </Text>
        </View>
      ))}
    </View>
  );
}

function UnitCard({ unit, usedBy }: { unit: Unit; usedBy: string | null }) {
  const { colors } = useAppTheme();
  return (
    <Link href={detail(unit)} asChild>
      <Pressable
        accessibilityRole="link"
        style={StyleSheet.flatten([styles.card, { backgroundColor: colors.surface, borderColor: colors.border }])}
      >
        <Thumb unit={unit} size={64} />
        <View style={styles.cardBody}>
          <View style={styles.cardTop}>
            <Text variant="heading" numberOfLines={1} style={styles.flex}>
              {unit.name}
            </Text>
            {unit.serialLabel ? (
              <Text variant="mono" tone="muted" numberOfLines={1} style={styles.serial}>
                {unit.serialLabel}
              </Text>
            ) : null}
          </View>
          <Text variant="caption" tone="muted">
            {generatorSummary(unit)}
          </Text>
          <BandTags unit={unit} />
          {usedBy ? (
            <Text variant="caption" tone="muted">
              {usedBy}
            </Text>
          ) : null}
        </View>
      </Pressable>
    </Link>
  );
}

function UnitTable({ units, usedBy }: { units: Unit[]; usedBy?: ReadonlyMap<number, string[]> }) {
  const { colors } = useAppTheme();
  const head = [
    { key: 'photo', label: '', style: styles.colPhoto },
    { key: 'name', label: 'Name', style: styles.colName },
    { key: 'serial', label: 'Serial', style: styles.colSerial },
    { key: 'generator', label: 'Generator · reference', style: styles.colGen },
    { key: 'bands', label: 'Filter bands', style: styles.colBands },
    ...(usedBy ? [{ key: 'used', label: 'Stations', style: styles.colUsed }] : []),
  ];
  return (
    <List style={[styles.table, { borderColor: colors.border, backgroundColor: colors.surface }]}>
      <View style={[styles.row, styles.headRow, { borderColor: colors.border }]}>
        {head.map((column) => (
          <Text key={column.key} variant="caption" tone="muted" style={[column.style, styles.headCell]}>
            {column.label}
          </Text>
        ))}
      </View>
      {units.map((unit, index) => (
        <ListItem key={unit.id}>
          <UnitRow unit={unit} last={index === units.length - 1} usedBy={usedBy ? (usedBy.get(unit.id) ?? []) : null} />
        </ListItem>
      ))}
    </List>
  );
}

function UnitRow({ unit, last, usedBy }: { unit: Unit; last: boolean; usedBy: string[] | null }) {
  const { colors } = useAppTheme();
  const [hovered, setHovered] = useState(false);
  return (
    <Link href={detail(unit)} asChild>
      <Pressable
        accessibilityRole="link"
        onHoverIn={() => setHovered(true)}
        onHoverOut={() => setHovered(false)}
        style={StyleSheet.flatten([
          styles.row,
          !last && { borderBottomWidth: 1, borderColor: colors.border },
          hovered && { backgroundColor: colors.primarySoft },
        ])}
      >
        <View style={styles.colPhoto}>
          <Thumb unit={unit} size={40} />
        </View>
        <Text variant="label" numberOfLines={1} style={styles.colName}>
          {unit.name}
        </Text>
        <Text variant="mono" tone="muted" numberOfLines={1} style={styles.colSerial}>
          {unit.serialLabel || '—'}
        </Text>
        <Text variant="caption" style={styles.colGen}>
          {generatorSummary(unit)}
        </Text>
        <View style={styles.colBands}>
          <BandTags unit={unit} />
        </View>
        {usedBy ? (
          <Text variant="caption" tone="muted" style={styles.colUsed}>
            {usedBy.length ? usedBy.join(', ') : 'none yet'}
          </Text>
        ) : null}
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  flex: { flex: 1 },
  cards: { gap: space.md },
  card: { borderWidth: 1, borderRadius: radius.lg, padding: space.lg, gap: space.md, flexDirection: 'row', alignItems: 'flex-start' },
  cardBody: { flex: 1, gap: space.xs, minWidth: 0 },
  cardTop: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  serial: { flexShrink: 1, maxWidth: '45%' },
  noPhoto: { borderWidth: 1, borderStyle: 'dashed', borderRadius: radius.sm, alignItems: 'center', justifyContent: 'center' },
  tags: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs, marginTop: 2 },
  tag: { borderRadius: radius.pill, paddingHorizontal: space.sm, paddingVertical: 1 },
  tagText: { fontFamily: fonts.mono, fontSize: 12 },
  table: { borderWidth: 1, borderRadius: radius.lg, overflow: 'hidden' },
  row: { flexDirection: 'row', alignItems: 'center', paddingHorizontal: space.lg, paddingVertical: space.md, gap: space.md },
  headRow: { borderBottomWidth: 1 },
  headCell: { textTransform: 'uppercase', letterSpacing: 0.6 },
  colPhoto: { width: 40 },
  colUsed: { flex: 2 },
  colName: { flex: 2.4 },
  colSerial: { flex: 1.2 },
  colGen: { flex: 2.2 },
  colBands: { flex: 2.4 },
});

import { Link, type Href } from 'expo-router';
import { useMemo, useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';

import type { ReviewRow } from '@/shared/schemas';

import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { EmptyState } from '../ui/query-states';
import { Text } from '../ui/text';
import { formatLocator } from '../ui/format';
import { radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { bandLabel, statusRank, statusWords, verdictSentence, type ReviewStatus } from './club-words';
import { FilterChips } from './filter-chips';
import { List, ListItem } from '../ui/list';

export type ReviewTableProps = {
  rows: ReviewRow[];
  /** Cards on a phone, columns on a wide screen. */
  layout: 'cards' | 'columns';
  stationHref: (row: ReviewRow) => Href;
  onSuspend: (row: ReviewRow) => void;
  onLift: (row: ReviewRow) => void;
};

type SortKey = 'status' | 'station' | 'member';
const ALL = 'all';

/** Every member's station with its verdict: filter by member, band and status; sort by status, station or member. */
export function ReviewTable({ rows, layout, stationHref, onSuspend, onLift }: ReviewTableProps) {
  const [status, setStatus] = useState<ReviewStatus | typeof ALL>(ALL);
  const [band, setBand] = useState<string>(ALL);
  const [member, setMember] = useState<string>(ALL);
  const [sort, setSort] = useState<SortKey>('status');

  const bands = useMemo(() => [...new Set(rows.flatMap((row) => row.bands))].sort(byBandLength), [rows]);
  const members = useMemo(
    () => [...new Map(rows.map((row) => [String(row.ownerId), row.ownerName])).entries()].sort((a, b) => a[1].localeCompare(b[1])),
    [rows],
  );
  const shown = useMemo(() => {
    const filtered = rows.filter(
      (row) =>
        (status === ALL || row.status === status) &&
        (band === ALL || row.bands.includes(band) || row.findings.some((finding) => finding.bandId === band)) &&
        (member === ALL || String(row.ownerId) === member),
    );
    const compare: Record<SortKey, (a: ReviewRow, b: ReviewRow) => number> = {
      status: (a, b) => statusRank[a.status] - statusRank[b.status] || a.stationName.localeCompare(b.stationName),
      station: (a, b) => a.stationName.localeCompare(b.stationName),
      member: (a, b) => a.ownerName.localeCompare(b.ownerName) || a.stationName.localeCompare(b.stationName),
    };
    return [...filtered].sort(compare[sort]);
  }, [rows, status, band, member, sort]);

  const countOf = (value: ReviewStatus) => rows.filter((row) => row.status === value).length;
  return (
    <View style={styles.wrap}>
      <View style={styles.filters}>
        <FilterChips
          label="Status"
          value={status}
          onChange={setStatus}
          options={[
            { value: ALL, label: 'All', count: rows.length },
            ...(['attention', 'suspended', 'off', 'ok'] as const).map((value) => ({
              value,
              label: statusWords[value].filter,
              count: countOf(value),
            })),
          ]}
        />
        {bands.length ? (
          <FilterChips
            label="Band"
            value={band}
            onChange={setBand}
            options={[{ value: ALL, label: 'All bands' }, ...bands.map((id) => ({ value: id, label: bandLabel(id) }))]}
          />
        ) : null}
        {members.length > 1 ? (
          <FilterChips
            label="Member"
            value={member}
            onChange={setMember}
            options={[{ value: ALL, label: 'Everyone' }, ...members.map(([id, name]) => ({ value: id, label: name }))]}
          />
        ) : null}
        <FilterChips
          label="Sort by"
          value={sort}
          onChange={setSort}
          options={[
            { value: 'status', label: 'Status' },
            { value: 'station', label: 'Station' },
            { value: 'member', label: 'Member' },
          ]}
        />
      </View>
      <Text variant="caption" tone="muted" accessibilityLiveRegion="polite">
        Showing {shown.length} of {rows.length} {rows.length === 1 ? 'station' : 'stations'}
      </Text>
      {shown.length === 0 ? (
        <EmptyState title="No station matches" message="Choose another status, band or member, or pick All." />
      ) : layout === 'columns' ? (
        <ReviewColumns rows={shown} stationHref={stationHref} onSuspend={onSuspend} onLift={onLift} />
      ) : (
        <View style={styles.cards}>
          {shown.map((row) => (
            <ReviewCard key={row.stationId} row={row} href={stationHref(row)} onSuspend={onSuspend} onLift={onLift} />
          ))}
        </View>
      )}
    </View>
  );
}

/** 2200m, 630m, 160m … 2m: longest wavelength first. */
function byBandLength(a: string, b: string) {
  return (parseFloat(b) || 0) - (parseFloat(a) || 0);
}

export function StatusPill({ status }: { status: ReviewStatus }) {
  const { colors } = useAppTheme();
  const look = {
    ok: { bg: colors.primarySoft, tone: 'primary' as const },
    attention: { bg: colors.signalSoft, tone: 'signal' as const },
    suspended: { bg: colors.dangerSoft, tone: 'danger' as const },
    off: { bg: colors.surfaceRaised, tone: 'muted' as const },
  }[status];
  return (
    <View style={[styles.pill, { backgroundColor: look.bg, borderColor: colors.border }]}>
      <Text variant="caption" tone={look.tone} style={styles.pillText}>
        {statusWords[status].short}
      </Text>
    </View>
  );
}

function Findings({ row }: { row: ReviewRow }) {
  if (!row.findings.length) return null;
  return (
    <View style={styles.findings} accessibilityLabel={`Findings for ${row.stationName}`}>
      {row.findings.map((finding, index) => (
        <View key={`${finding.code}-${finding.bandId ?? ''}-${index}`} style={styles.finding}>
          <Text variant="caption" tone="signal" style={styles.bullet}>
            ▸
          </Text>
          <Text variant="caption" style={styles.findingText}>
            {finding.message}
          </Text>
        </View>
      ))}
    </View>
  );
}

function BandList({ bands }: { bands: string[] }) {
  return (
    <Text variant="mono" tone={bands.length ? 'default' : 'muted'}>
      {bands.length ? bands.map(bandLabel).join(' · ') : 'no bands'}
    </Text>
  );
}

type RowActionsProps = { row: ReviewRow; href: Href; onSuspend: (row: ReviewRow) => void; onLift: (row: ReviewRow) => void };

function RowActions({ row, href, onSuspend, onLift }: RowActionsProps) {
  return (
    <View style={styles.actions}>
      <Link href={href} asChild>
        <Pressable accessibilityRole="link" accessibilityLabel={`Open ${row.stationName}`} hitSlop={6} style={styles.openLink}>
          <Text variant="label" tone="primary" style={styles.underline}>
            Open
          </Text>
        </Pressable>
      </Link>
      {row.suspension ? (
        <Button
          label="Lift"
          variant="secondary"
          accessibilityLabel={`Lift the stop on ${row.stationName}`}
          onPress={() => onLift(row)}
          style={styles.smallButton}
        />
      ) : (
        <Button
          label="Suspend"
          variant="ghost"
          accessibilityLabel={`Suspend ${row.stationName}`}
          onPress={() => onSuspend(row)}
          style={styles.smallButton}
        />
      )}
    </View>
  );
}

function ReviewCard({ row, href, onSuspend, onLift }: Omit<RowActionsProps, 'href'> & { href: Href }) {
  return (
    <Card style={styles.card}>
      <View style={styles.cardHead}>
        <View style={styles.grow}>
          <Text variant="heading">{row.stationName}</Text>
          <Text variant="mono" tone="muted">
            {row.callsign} · {formatLocator(row.locator)}
          </Text>
        </View>
        <StatusPill status={row.status} />
      </View>
      <Text variant="label" tone="muted">
        {row.ownerName}
      </Text>
      <BandList bands={row.bands} />
      <Text>{verdictSentence(row)}</Text>
      <Findings row={row} />
      <RowActions row={row} href={href} onSuspend={onSuspend} onLift={onLift} />
    </Card>
  );
}

function ReviewColumns({ rows, stationHref, onSuspend, onLift }: Omit<ReviewTableProps, 'layout'>) {
  const { colors } = useAppTheme();
  return (
    <List style={[styles.table, { borderColor: colors.border, backgroundColor: colors.surface }]}>
      <View style={[styles.tr, styles.thead, { borderColor: colors.border }]}>
        {['Station', 'Member', 'Bands', 'Verdict', ''].map((title, index) => (
          <Text key={index} variant="caption" tone="muted" style={columnStyles[index]}>
            {title}
          </Text>
        ))}
      </View>
      {rows.map((row, index) => (
        <ListItem key={row.stationId} style={[styles.tr, { borderColor: colors.border }, index === rows.length - 1 && styles.lastRow]}>
          <View style={columnStyles[0]}>
            <Text variant="label">{row.stationName}</Text>
            <Text variant="mono" tone="muted" style={styles.small}>
              {row.callsign} · {formatLocator(row.locator)}
            </Text>
          </View>
          <Text style={columnStyles[1]}>{row.ownerName}</Text>
          <View style={columnStyles[2]}>
            <BandList bands={row.bands} />
          </View>
          <View style={[columnStyles[3], styles.verdictCell]}>
            <StatusPill status={row.status} />
            <Text variant="caption">{verdictSentence(row)}</Text>
            <Findings row={row} />
          </View>
          <View style={columnStyles[4]}>
            <RowActions row={row} href={stationHref(row)} onSuspend={onSuspend} onLift={onLift} />
          </View>
        </ListItem>
      ))}
    </List>
  );
}

const columns = StyleSheet.create({
  station: { flex: 2.2, minWidth: 0, paddingRight: space.md },
  member: { flex: 1.4, minWidth: 0, paddingRight: space.md },
  bands: { flex: 1.4, minWidth: 0, paddingRight: space.md },
  verdict: { flex: 4, minWidth: 0, paddingRight: space.md },
  actions: { flex: 1.6, minWidth: 0 },
});
const columnStyles = [columns.station, columns.member, columns.bands, columns.verdict, columns.actions];

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  filters: { gap: space.md },
  cards: { gap: space.md },
  card: { gap: space.sm },
  cardHead: { flexDirection: 'row', alignItems: 'flex-start', gap: space.md },
  grow: { flex: 1, minWidth: 0 },
  pill: { borderRadius: radius.pill, borderWidth: 1, paddingHorizontal: space.md, paddingVertical: 2, alignSelf: 'flex-start' },
  pillText: { fontWeight: '600' },
  findings: { gap: space.xs },
  finding: { flexDirection: 'row', gap: space.xs },
  bullet: { width: 12 },
  findingText: { flex: 1, minWidth: 0 },
  actions: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap', gap: space.sm, marginTop: space.xs },
  openLink: { paddingVertical: space.sm, paddingHorizontal: space.xs },
  underline: { textDecorationLine: 'underline' },
  smallButton: { minHeight: 38, paddingHorizontal: space.md },
  table: { borderWidth: 1, borderRadius: radius.lg, overflow: 'hidden' },
  thead: { paddingVertical: space.sm },
  tr: { flexDirection: 'row', alignItems: 'flex-start', paddingHorizontal: space.lg, paddingVertical: space.md, borderBottomWidth: 1 },
  lastRow: { borderBottomWidth: 0 },
  verdictCell: { gap: space.xs },
  small: { fontSize: 13 },
});

import { Platform, ScrollView, StyleSheet, View } from 'react-native';

import type { ReceptionPage, ReceptionReport } from '@/shared/api/receptions';

import { Button } from '../ui/button';
import { formatUtcDateTime } from '../ui/format';
import { Text } from '../ui/text';
import { radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { ChoiceChips } from '../ui/choice-chips';
import { bandColour } from './colours';
import { bandName, formatBearing, formatCount, formatDb, formatHz, formatKm } from './format';
import type { ReceptionSort } from './queries';

export type ReceptionTableProps = {
  page: ReceptionPage;
  sort: ReceptionSort;
  order: 'asc' | 'desc';
  wide: boolean;
  busy?: boolean;
  onSort: (sort: ReceptionSort, order: 'asc' | 'desc') => void;
  onPage: (page: number) => void;
};

const SORTS: { value: ReceptionSort; label: string }[] = [
  { value: 'time', label: 'Time' },
  { value: 'distance', label: 'Distance' },
  { value: 'snr', label: 'SNR' },
  { value: 'band', label: 'Band' },
  { value: 'receiver', label: 'Receiver' },
];

type Column = { key: string; title: string; width: number; sort?: ReceptionSort; value: (r: ReceptionReport) => string; mono?: boolean };

const COLUMNS: Column[] = [
  {
    key: 'time',
    title: 'Slot (UTC)',
    width: 150,
    sort: 'time',
    value: (r) => formatUtcDateTime(r.slotUtc).replace(' UTC', ''),
    mono: true,
  },
  { key: 'band', title: 'Band', width: 64, sort: 'band', value: (r) => bandName(r.bandId) },
  { key: 'receiver', title: 'Receiver', width: 104, sort: 'receiver', value: (r) => r.rxCallsign, mono: true },
  { key: 'locator', title: 'Locator', width: 76, value: (r) => r.rxLocator, mono: true },
  { key: 'km', title: 'Distance', width: 88, sort: 'distance', value: (r) => formatKm(r.distanceKm) },
  { key: 'bearing', title: 'Bearing', width: 66, value: (r) => formatBearing(r.bearingDeg) },
  { key: 'snr', title: 'SNR', width: 64, sort: 'snr', value: (r) => formatDb(r.snrDb) },
  { key: 'error', title: 'Off plan', width: 72, value: (r) => formatHz(r.frequencyErrorHz) },
  { key: 'drift', title: 'Drift', width: 56, value: (r) => formatHz(r.driftHz) },
];

function ReportCard({ report }: { report: ReceptionReport }) {
  const { colors } = useAppTheme();
  return (
    <View style={[styles.card, { borderColor: colors.border, backgroundColor: colors.surface }]} accessibilityRole="summary">
      <View style={styles.cardTop}>
        <View style={[styles.bandDot, { backgroundColor: bandColour(report.bandId) }]} />
        <Text variant="label">{bandName(report.bandId)}</Text>
        <Text variant="mono" style={styles.grow}>
          {report.rxCallsign}
        </Text>
        <Text variant="label">{formatDb(report.snrDb)}</Text>
      </View>
      <Text variant="caption" tone="muted">
        {formatUtcDateTime(report.slotUtc)} · {report.rxLocator} · {formatKm(report.distanceKm)} at {formatBearing(report.bearingDeg)}
      </Text>
      <Text variant="caption" tone="muted">
        Off plan {formatHz(report.frequencyErrorHz)} · drift {formatHz(report.driftHz)}
        {report.ambiguous ? ' · could be either of two stations' : ''}
      </Text>
    </View>
  );
}

function TableRows({ page, wide }: { page: ReceptionPage; wide: boolean }) {
  const { colors } = useAppTheme();
  if (!wide) return page.reports.map((report) => <ReportCard key={report.id} report={report} />);
  const header = (
    <View style={[styles.row, styles.headerRow, { borderColor: colors.border }]} {...webRole('row')}>
      {COLUMNS.map((c) => (
        <Text key={c.key} variant="label" tone="muted" style={{ width: c.width }} {...webRole('columnheader')}>
          {c.title}
        </Text>
      ))}
    </View>
  );
  return (
    <ScrollView horizontal contentContainerStyle={styles.tableScroll}>
      <View accessibilityLabel="Reports" {...webRole('table')}>
        {header}
        {page.reports.map((report, i) => (
          <View
            key={report.id}
            style={[styles.row, { borderColor: colors.border }, i % 2 === 1 && { backgroundColor: colors.surface }]}
            accessibilityLabel={`${report.rxCallsign} on ${bandName(report.bandId)} at ${formatUtcDateTime(report.slotUtc)}`}
            {...webRole('row')}
          >
            {COLUMNS.map((c) => (
              <Text
                key={c.key}
                variant={c.mono ? 'mono' : 'body'}
                style={[{ width: c.width }, styles.cell]}
                numberOfLines={1}
                {...webRole('cell')}
              >
                {c.value(report)}
              </Text>
            ))}
          </View>
        ))}
      </View>
    </ScrollView>
  );
}

const webRole = (role: string) => (Platform.OS === 'web' ? ({ role } as object) : {});

/** The period's reports, a page at a time: a table on wide screens, one card per report on a phone. */
export function ReceptionTable({ page, sort, order, wide, busy, onSort, onPage }: ReceptionTableProps) {
  const pages = Math.max(1, Math.ceil(page.total / page.pageSize));
  const first = page.total === 0 ? 0 : (page.page - 1) * page.pageSize + 1;
  const last = Math.min(page.total, page.page * page.pageSize);
  return (
    <View style={styles.root}>
      <View style={styles.controls}>
        <ChoiceChips label="Sort by" options={SORTS} value={sort} onChange={(next) => onSort(next, next === sort ? order : 'desc')} />
        <ChoiceChips
          label="Order"
          options={[
            { value: 'desc', label: sort === 'time' ? 'Newest first' : 'Highest first' },
            { value: 'asc', label: sort === 'time' ? 'Oldest first' : 'Lowest first' },
          ]}
          value={order}
          onChange={(next) => onSort(sort, next)}
        />
      </View>
      <TableRows page={page} wide={wide} />
      <View style={styles.pager}>
        <Button label="Previous page" variant="secondary" disabled={page.page <= 1 || busy} onPress={() => onPage(page.page - 1)} />
        <Text variant="caption" tone="muted" accessibilityLiveRegion="polite">
          {formatCount(first)}–{formatCount(last)} of {formatCount(page.total)} · page {page.page} of {formatCount(pages)}
        </Text>
        <Button label="Next page" variant="secondary" disabled={page.page >= pages || busy} onPress={() => onPage(page.page + 1)} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: space.md },
  controls: { gap: space.sm },
  card: { borderWidth: 1, borderRadius: radius.md, padding: space.md, gap: 2 },
  cardTop: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  bandDot: { width: 10, height: 10, borderRadius: 5 },
  grow: { flex: 1 },
  tableScroll: { flexGrow: 1 },
  row: { flexDirection: 'row', gap: space.sm, paddingVertical: 6, paddingHorizontal: space.sm, borderBottomWidth: 1 },
  headerRow: { borderBottomWidth: 2 },
  cell: { fontSize: 14 },
  pager: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.md, justifyContent: 'space-between' },
});

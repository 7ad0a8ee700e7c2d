import { StyleSheet, View } from 'react-native';

import type { ImportPreview } from '@/shared/api/receptions';

import { Text } from '../ui/text';
import { radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';

const FIELD_ORDER = [
  'slotUtc',
  'bandId',
  'txCallsign',
  'txLocator',
  'txPowerDbm',
  'rxCallsign',
  'rxLocator',
  'snrDb',
  'frequencyHz',
  'driftHz',
];

function describe(report: Record<string, string | number | null>): string {
  const keys = [...FIELD_ORDER.filter((k) => k in report), ...Object.keys(report).filter((k) => !FIELD_ORDER.includes(k))];
  return keys.map((k) => `${k} ${report[k] ?? '—'}`).join(' · ');
}

/** The first rows as Faintline will read them, or why a row would be set aside. */
export function PreviewRows({ preview }: { preview: ImportPreview }) {
  const { colors } = useAppTheme();
  const rejected = preview.rows.filter((r) => r.problem).length;
  return (
    <View style={styles.root}>
      <Text variant="caption" tone="muted" accessibilityLiveRegion="polite">
        First {preview.rows.length} rows: {preview.rows.length - rejected} read, {rejected} would be rejected.
      </Text>
      {preview.rows.map((row) => (
        <View
          key={row.rowNumber}
          style={[
            styles.row,
            { borderColor: row.problem ? colors.danger : colors.border, backgroundColor: row.problem ? colors.dangerSoft : colors.surface },
          ]}
        >
          <Text variant="label">Row {row.rowNumber}</Text>
          {row.report ? (
            <Text variant="mono" style={styles.mono}>
              {describe(row.report)}
            </Text>
          ) : null}
          {row.problem ? (
            <Text variant="caption" tone="danger">
              {row.problem}
            </Text>
          ) : null}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: space.xs },
  row: { borderWidth: 1, borderRadius: radius.sm, padding: space.sm, gap: 2 },
  mono: { fontSize: 13, lineHeight: 18 },
});

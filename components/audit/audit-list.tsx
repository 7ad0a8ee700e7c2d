import { Platform, StyleSheet, View } from 'react-native';

import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { formatUtcDateTime } from '../ui/format';
import { fonts, radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import type { AuditEntry } from './queries';

export type AuditListProps = { entries: AuditEntry[]; showActor?: boolean };

const entityWords: Record<string, string> = {
  station: 'Station',
  unit: 'Unit',
  band: 'Band',
  calibration: 'Calibration',
  schedule: 'Schedule',
  club: 'Club',
  membership: 'Membership',
  invitation: 'Invitation',
  proposal: 'Offset proposal',
  suspension: 'Suspension',
  photo: 'Photo',
};

/** Who did what and when (UTC), with the changed values before → after. */
export function AuditList({ entries, showActor = true }: AuditListProps) {
  return (
    <View style={styles.list}>
      {entries.map((entry) => {
        const changes = summariseChange(entry.before, entry.after);
        return (
          <Card key={entry.id} style={styles.card}>
            <View style={styles.head}>
              <Text variant="mono" tone="muted" style={styles.time}>
                {formatUtcDateTime(entry.atUtc)}
              </Text>
              <Text variant="caption" tone="primary">
                {entityWords[entry.entityType] ?? entry.entityType}
              </Text>
            </View>
            <Text>
              {showActor ? <Text variant="label">{entry.actorName}: </Text> : null}
              {entry.summary}
            </Text>
            {changes.length ? (
              <View style={styles.changes}>
                {changes.map((change) => (
                  <Text key={change.key} variant="caption" style={styles.change}>
                    <Text variant="caption" tone="muted">
                      {change.key}:{' '}
                    </Text>
                    {change.before} → {change.after}
                  </Text>
                ))}
              </View>
            ) : null}
          </Card>
        );
      })}
    </View>
  );
}

type Change = { key: string; before: string; after: string };

/** The keys whose values differ, each as short text; at most six. */
export function summariseChange(before: unknown, after: unknown): Change[] {
  const isObject = (value: unknown): value is Record<string, unknown> => !!value && typeof value === 'object' && !Array.isArray(value);
  if (!isObject(before) && !isObject(after)) {
    if (before == null && after == null) return [];
    if (JSON.stringify(before) === JSON.stringify(after)) return [];
    return [{ key: 'value', before: short(before), after: short(after) }];
  }
  const a = isObject(before) ? before : {};
  const b = isObject(after) ? after : {};
  const keys = [...new Set([...Object.keys(a), ...Object.keys(b)])].filter((key) => JSON.stringify(a[key]) !== JSON.stringify(b[key]));
  return keys.slice(0, 6).map((key) => ({ key, before: short(a[key]), after: short(b[key]) }));
}

function short(value: unknown): string {
  if (value === undefined || value === null || value === '') return '—';
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  const text = typeof value === 'string' ? value : JSON.stringify(value);
  return text.length > 60 ? `${text.slice(0, 57)}…` : text;
}

export type AuditIntroProps = { text: string; csvHref: string };

/** What a log holds, in a sentence, with its CSV download beside it (below it on a phone). */
export function AuditIntro({ text, csvHref }: AuditIntroProps) {
  return (
    <View style={styles.intro}>
      <Text tone="muted" style={styles.introText}>
        {text}
      </Text>
      <CsvLink href={csvHref} />
    </View>
  );
}

export type CsvLinkProps = { href: string; label?: string };

/** A plain anchor to the CSV download (the server answers with an attachment). */
export function CsvLink({ href, label = 'Download CSV' }: CsvLinkProps) {
  const { colors } = useAppTheme();
  const web = Platform.OS === 'web' ? ({ href, hrefAttrs: { download: true } } as object) : {};
  return (
    <Text
      accessibilityRole="link"
      accessibilityLabel={label}
      {...web}
      style={[styles.csv, { borderColor: colors.primary, color: colors.primary }]}
    >
      {label}
    </Text>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  card: { gap: space.xs, paddingVertical: space.md },
  head: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', gap: space.sm },
  time: { fontSize: 13 },
  changes: { gap: 2, marginTop: space.xs },
  change: { fontFamily: fonts.mono },
  intro: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.md },
  introText: { flex: 1, minWidth: 220 },
  csv: {
    fontFamily: fonts.medium,
    fontSize: 16,
    lineHeight: 22,
    borderWidth: 1.5,
    borderRadius: radius.md,
    paddingHorizontal: space.lg,
    paddingVertical: 10,
    textAlign: 'center',
    alignSelf: 'flex-start',
  },
});

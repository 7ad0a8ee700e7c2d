import { Platform, StyleSheet, View } from 'react-native';

import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { formatUtcDateTime } from '../ui/format';
import { fonts, radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { describeChange, type ChangeLine } from './change-sentences';
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

/** Who did what and when (UTC), with the changes in words, before → after. */
export function AuditList({ entries, showActor = true }: AuditListProps) {
  return (
    <View style={styles.list}>
      {entries.map((entry) => {
        const changes = describeChange(entry).slice(0, 8);
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
                  <Text key={change.label} variant="caption">
                    <Text variant="caption" tone="muted">
                      {change.label}:{' '}
                    </Text>
                    {changeText(change)}
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

/** "before → after", or only the side there is: "was 20 m for 1 slot" / "now enabled". */
function changeText(change: ChangeLine): string {
  if (change.before === null) return change.after ?? '—';
  if (change.after === null) return `was ${change.before}`;
  return `${change.before} → ${change.after}`;
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

import { StyleSheet, View } from 'react-native';

import type { ImportStatus } from '@/shared/api/receptions';

import { formatCount } from '../receptions/format';
import { Card } from '../ui/card';
import { formatUtcDateTime } from '../ui/format';
import { Text } from '../ui/text';
import { radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { DownloadLink } from '../workshop/download-link';
import { rejectedRowsHref } from './queries';
import { formatBytes } from './sample';

/** A progress bar with its value for screen readers. */
export function ProgressBar({ label, fraction }: { label: string; fraction: number }) {
  const { colors } = useAppTheme();
  const percent = Math.round(Math.min(1, Math.max(0, fraction)) * 100);
  return (
    <View
      accessibilityRole="progressbar"
      accessibilityLabel={label}
      accessibilityValue={{ min: 0, max: 100, now: percent }}
      style={[styles.track, { backgroundColor: colors.primarySoft, borderColor: colors.border }]}
    >
      <View style={[styles.fill, { width: `${percent}%`, backgroundColor: colors.primary }]} />
    </View>
  );
}

const STATUS_WORDS: Record<ImportStatus['status'], string> = { running: 'Importing', done: 'Finished', failed: 'Stopped with an error' };

/** One import job: progress while it runs, then what it stored and what it set aside. */
export function ImportProgress({ job }: { job: ImportStatus }) {
  const fraction = job.bytesTotal > 0 ? job.bytesRead / job.bytesTotal : job.status === 'running' ? 0 : 1;
  return (
    <Card tone={job.status === 'failed' ? 'plain' : job.status === 'done' ? 'primary' : 'plain'}>
      <View style={styles.head}>
        <Text variant="heading" style={styles.grow} numberOfLines={1}>
          {job.fileName}
        </Text>
        <Text variant="label" tone={job.status === 'failed' ? 'danger' : 'muted'}>
          {STATUS_WORDS[job.status]}
        </Text>
      </View>
      {job.status === 'running' ? (
        <>
          <ProgressBar label={`Import of ${job.fileName}`} fraction={fraction} />
          <Text variant="caption" tone="muted" accessibilityLiveRegion="polite">
            {formatBytes(job.bytesRead)} of {formatBytes(job.bytesTotal)} read · {formatCount(job.rowsRead)} rows so far
          </Text>
        </>
      ) : null}
      <View style={styles.counts}>
        {[
          ['Rows read', job.rowsRead],
          ['Imported', job.imported],
          ['Already there', job.duplicates],
          ['Rejected', job.rejected],
        ].map(([label, value]) => (
          <View key={label} style={styles.count}>
            <Text variant="caption" tone="muted">
              {label}
            </Text>
            <Text variant="mono" accessibilityLabel={`${label}: ${value}`}>
              {formatCount(value as number)}
            </Text>
          </View>
        ))}
      </View>
      {job.error ? (
        <Text tone="danger" accessibilityRole="alert">
          {job.error}
        </Text>
      ) : null}
      <Text variant="caption" tone="muted">
        Started {formatUtcDateTime(job.createdAt)}
        {job.finishedAt ? ` · ended ${formatUtcDateTime(job.finishedAt)}` : ''}
      </Text>
      {job.rejected > 0 && job.status !== 'running' ? (
        <DownloadLink href={rejectedRowsHref(job.id)} label="Download the rejected rows (CSV)" fileName={`rejected-rows-${job.id}.csv`} />
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  track: { height: 12, borderRadius: radius.pill, borderWidth: 1, overflow: 'hidden' },
  fill: { height: '100%', borderRadius: radius.pill },
  head: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  grow: { flex: 1 },
  counts: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  count: { minWidth: 80 },
});

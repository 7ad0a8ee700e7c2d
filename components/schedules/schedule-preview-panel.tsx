import { StyleSheet, View } from 'react-native';

import type { ScheduleIssue } from '@/shared/domain/schedule';

import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { space } from '../ui/theme';
import { AirtimeSummary } from './airtime-summary';
import { NextTransmissions, type UpcomingTransmission } from './next-transmissions';
import type { SchedulePreview } from './preview-model';
import { ScheduleTimeline } from './schedule-timeline';
import { Heading } from '../ui/heading';

export type SchedulePreviewPanelProps = {
  preview: SchedulePreview | null;
  /** The server's coming transmissions; left out in the editor, where only the draft exists. */
  upcoming?: readonly UpcomingTransmission[];
  quietMessage?: string;
  /** Shown over the timeline, e.g. that a draft is not saved yet. */
  note?: string;
  issues?: readonly ScheduleIssue[];
  now?: () => number;
};

/** Timeline, next transmissions and time on the air for one plan. */
export function SchedulePreviewPanel({ preview, upcoming, quietMessage, note, now }: SchedulePreviewPanelProps) {
  if (!preview) {
    return (
      <Card>
        <Heading level={2}>Preview</Heading>
        <Text tone="muted">Fix the marked fields to see the timeline.</Text>
      </Card>
    );
  }
  const quiet = preview.plan.quiet.map((q) => q.message);
  return (
    <View style={styles.wrap}>
      <ScheduleTimeline model={preview.timeline} note={note} />
      {quiet.length && !upcoming ? (
        <Text variant="caption" tone="signal">
          {quiet.join(' ')}
        </Text>
      ) : null}
      {upcoming ? <NextTransmissions transmissions={upcoming} now={now} quietMessage={quietMessage ?? quiet.join(' ')} /> : null}
      <AirtimeSummary plan={preview.plan} days={preview.days} />
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: space.lg } });

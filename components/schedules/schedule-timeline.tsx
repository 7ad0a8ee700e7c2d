import { lazy, Suspense, useState } from 'react';
import { ActivityIndicator, StyleSheet, View } from 'react-native';

import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { formatUtcTime } from '../ui/format';
import type { TimelineModel } from './timeline-model';
import { Heading } from '../ui/heading';

// victory is large and only these screens draw it: keep it out of the entry bundle
const TimelineChart = lazy(() => import('../charts/all-charts').then((m) => ({ default: m.TimelineChart })));

export type ScheduleTimelineProps = { model: TimelineModel; title?: string; note?: string };

/** The coming 24 hours (UTC) by band, with a text summary that screen readers and tests read. */
export function ScheduleTimeline({ model, title = 'Next 24 hours (UTC)', note }: ScheduleTimelineProps) {
  const { colors } = useAppTheme();
  const [width, setWidth] = useState(0);
  const total = model.marks.length;
  const summary = model.lanes.map((lane) => `${lane.label.replace('\u00a0', ' ')}: ${lane.transmissions}`).join(', ') || 'no bands';
  return (
    <Card>
      <View style={styles.head}>
        <Heading level={2}>{title}</Heading>
        <Text variant="caption" tone="muted">
          {formatUtcTime(model.fromMs)} to {formatUtcTime(model.toMs)}
        </Text>
      </View>
      <View
        accessibilityRole="image"
        accessibilityLabel={`Timeline of ${total} transmissions from ${formatUtcTime(model.fromMs)}: ${summary}`}
        onLayout={(event) => setWidth(Math.floor(event.nativeEvent.layout.width))}
        style={styles.chartBox}
      >
        {width > 0 ? (
          <Suspense
            fallback={<ActivityIndicator color={colors.primary} style={styles.loading} accessibilityLabel="Loading the timeline" />}
          >
            <TimelineChart model={model} width={width} />
          </Suspense>
        ) : null}
      </View>
      <View style={styles.legend}>
        {model.lanes.map((lane) => (
          <Text key={lane.bandId} variant="caption" tone="muted">
            <Text variant="caption" style={{ color: colors.text }}>
              {lane.label}
            </Text>{' '}
            {lane.transmissions === 1 ? '1 transmission' : `${lane.transmissions} transmissions`}
          </Text>
        ))}
        <Text variant="caption" tone="signal">
          ▏ now
        </Text>
      </View>
      {note ? (
        <Text variant="caption" tone="muted">
          {note}
        </Text>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  head: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', alignItems: 'baseline', gap: space.sm },
  chartBox: { width: '100%', minHeight: 90, overflow: 'hidden' },
  loading: { marginVertical: space.xl },
  legend: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.lg, rowGap: space.xs },
});

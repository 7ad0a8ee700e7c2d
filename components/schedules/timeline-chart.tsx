/**
 * The 24-hour UTC timeline: one lane per band, a mark per planned transmission, the
 * present moment as a signal-amber rule. Loaded lazily (see lazy-timeline.tsx): victory
 * is large, and only the schedule screens draw it.
 */
import { Rect } from 'react-native-svg';
import { VictoryAxis } from 'victory-native/lib/components/victory-axis';
import { VictoryChart } from 'victory-native/lib/components/victory-chart';
import { VictoryLine } from 'victory-native/lib/components/victory-line';
import { VictoryScatter } from 'victory-native/lib/components/victory-scatter';

import { axisTextOf, timeAxisStyleOf } from '../charts/axis-styles';
import { fonts } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import type { TimelineModel } from './timeline-model';

export type TimelineChartProps = { model: TimelineModel; width: number };

const LANE_HEIGHT = 34;
const PAD = { top: 12, bottom: 44, left: 52, right: 16 };

/** A transmission: a slim upright bar centred on its lane (two minutes are too short to draw to scale). */
function TransmissionMark({ x, y, fill }: { x?: number; y?: number; fill: string }) {
  if (x === undefined || y === undefined) return null;
  return <Rect x={x - 1} y={y - 9} width={2.2} height={18} rx={1} fill={fill} />;
}

export default function TimelineChart({ model, width }: TimelineChartProps) {
  const { colors } = useAppTheme();
  const lanes = model.lanes.length;
  const height = PAD.top + PAD.bottom + Math.max(1, lanes) * LANE_HEIGHT;
  const tickStepH = width < 520 ? 6 : 3;
  const ticks = model.hourTicksMs.filter((_, i) => i % tickStepH === 0);
  const axisText = axisTextOf(colors);
  return (
    <VictoryChart
      width={width}
      height={height}
      padding={PAD}
      domain={{ x: [model.fromMs, model.toMs], y: [0.5, Math.max(1, lanes) + 0.5] }}
      standalone
    >
      <VictoryAxis tickValues={ticks} tickFormat={(t: number) => model.hourLabel(t)} label="UTC" style={timeAxisStyleOf(colors)} />
      <VictoryAxis
        dependentAxis
        tickValues={model.lanes.map((_, i) => i + 1)}
        tickFormat={(t: number) => model.lanes[t - 1]?.label ?? ''}
        style={{
          axis: { stroke: 'transparent' },
          tickLabels: { ...axisText, fill: colors.text, fontFamily: fonts.monoMedium },
          grid: { stroke: colors.primarySoft, strokeWidth: LANE_HEIGHT - 8 },
        }}
      />
      <VictoryScatter
        data={model.marks.map((m) => ({ x: m.startMs, y: m.lane + 1 }))}
        dataComponent={<TransmissionMark fill={colors.primary} />}
      />
      {model.nowMs >= model.fromMs && model.nowMs <= model.toMs ? (
        <VictoryLine
          data={[
            { x: model.nowMs, y: 0.5 },
            { x: model.nowMs, y: Math.max(1, lanes) + 0.5 },
          ]}
          style={{ data: { stroke: colors.signal, strokeWidth: 2 } }}
        />
      ) : null}
    </VictoryChart>
  );
}

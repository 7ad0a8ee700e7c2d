import { fonts, type Palette } from '../ui/theme';

/** Tick text every chart shares: small mono figures in the muted colour. */
export const axisTextOf = (colors: Palette) => ({ fontFamily: fonts.mono, fontSize: 11, fill: colors.textMuted });

/** The UTC time axis along the bottom of the timeline and the health charts, with its dashed grid. */
export function timeAxisStyleOf(colors: Palette) {
  const axisText = axisTextOf(colors);
  return {
    axis: { stroke: colors.border },
    ticks: { stroke: colors.border, size: 4 },
    tickLabels: axisText,
    grid: { stroke: colors.border, strokeDasharray: '2,4' },
    axisLabel: { ...axisText, fontFamily: fonts.medium, fontSize: 12, padding: 28, fill: colors.text },
  };
}

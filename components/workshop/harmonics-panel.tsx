import { StyleSheet, View } from 'react-native';

import type { HarmonicsVerdict } from '@/shared/domain/workshop';

import { Text } from '../ui/text';
import { radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { formatValue } from '../ui/format';

export type HarmonicsPanelProps = { harmonics: HarmonicsVerdict; bandName: string };

const db = (value: number | null, unit: string) => (value === null ? '—' : formatValue(value, 1, unit));

/** Each harmonic's level before and after the low-pass filter against the region's limit, with a verdict in words. */
export function HarmonicsPanel({ harmonics, bandName }: HarmonicsPanelProps) {
  const { colors } = useAppTheme();
  const { limit } = harmonics;
  const verdict =
    harmonics.pass === true
      ? { tone: 'primary' as const, title: `Passes on ${bandName}` }
      : harmonics.pass === false
        ? { tone: 'danger' as const, title: `Fails on ${bandName}: do not transmit` }
        : { tone: 'signal' as const, title: `Cannot tell on ${bandName}: measure first` };
  return (
    <View style={styles.wrap}>
      <View
        style={[
          styles.verdict,
          {
            borderColor: verdict.tone === 'primary' ? colors.primary : verdict.tone === 'danger' ? colors.danger : colors.signal,
            backgroundColor:
              verdict.tone === 'primary' ? colors.primarySoft : verdict.tone === 'danger' ? colors.dangerSoft : colors.signalSoft,
          },
        ]}
        accessibilityRole={harmonics.pass === true ? undefined : 'alert'}
      >
        <Text variant="heading">{verdict.title}</Text>
        <Text>{harmonics.summary}</Text>
      </View>
      <Text>
        Limit: <Text variant="label">{limit.rule}</Text>
      </Text>
      <Text variant="caption" tone="muted">
        Source: {limit.source}
      </Text>
      <View style={[styles.table, { borderColor: colors.border }]}>
        <View style={[styles.row, styles.headRow, { borderColor: colors.border }]}>
          {['n', 'MHz', 'Raw dBc', 'Filter dB', 'Result dBc', 'Verdict'].map((label, index) => (
            <Text key={index} variant="caption" tone="muted" style={[cells[index], styles.headCell]}>
              {label}
            </Text>
          ))}
        </View>
        {harmonics.harmonics.map((h) => (
          <View key={h.harmonic} style={[styles.row, { borderColor: colors.border }]} accessibilityLabel={`Harmonic ${h.harmonic}`}>
            <Text variant="mono" style={[styles.cell, cells[0]]}>
              {h.harmonic}
            </Text>
            <Text variant="mono" style={[styles.cell, cells[1]]}>
              {(h.frequencyHz / 1e6).toFixed(3)}
            </Text>
            <Text variant="mono" style={[styles.cell, cells[2]]}>
              {h.rawDbc === null ? 'none' : db(h.rawDbc, '')}
            </Text>
            <Text variant="mono" style={[styles.cell, cells[3]]}>
              {h.rawDbc === null ? '' : h.filterDb === null ? '?' : formatValue(-h.filterDb, 1, '')}
            </Text>
            <Text variant="mono" style={[styles.cell, cells[4]]}>
              {h.rawDbc === null ? '' : db(h.resultDbc, '')}
            </Text>
            <Text variant="label" tone={h.pass === false ? 'danger' : h.pass === null ? 'signal' : 'primary'} style={cells[5]}>
              {h.rawDbc === null ? '—' : h.pass === false ? 'Fail' : h.pass === null ? 'Unknown' : 'Pass'}
            </Text>
          </View>
        ))}
      </View>
      <Text variant="caption" tone="muted">
        Raw levels are those of the generator’s square-wave output (even harmonics vanish at 50 % duty); filter attenuation is modelled from
        the filter’s type, order and cut-off. The limit applies to every harmonic: {formatValue(-limit.limitDb, 1, 'dBc')} or lower.
      </Text>
      <Text variant="caption">
        Rules differ by country, and your local licence conditions always win over these defaults. Check the result with a spectrum analyser
        when you can.
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  verdict: { borderWidth: 1, borderLeftWidth: 4, borderRadius: radius.md, padding: space.md, gap: space.xs },
  table: { borderWidth: 1, borderRadius: radius.md, overflow: 'hidden' },
  row: { flexDirection: 'row', alignItems: 'center', paddingHorizontal: space.sm, paddingVertical: 6, gap: space.xs, borderTopWidth: 1 },
  headRow: { borderTopWidth: 0 },
  headCell: { textTransform: 'uppercase', letterSpacing: 0.4, fontSize: 11 },
  cell: { fontSize: 13, lineHeight: 18 },
  c0: { width: 30 },
  // wide enough for "−105.8" in 13 px mono, so a level never breaks inside the number
  c1: { flex: 1.5, minWidth: 50 },
  c2: { flex: 1.2, minWidth: 50, textAlign: 'right' },
  c3: { flex: 1.1, minWidth: 50, textAlign: 'right' },
  c4: { flex: 1.2, minWidth: 50, textAlign: 'right' },
  c5: { width: 56, textAlign: 'right' },
});
const cells = [styles.c0, styles.c1, styles.c2, styles.c3, styles.c4, styles.c5];

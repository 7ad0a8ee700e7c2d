import { StyleSheet, View } from 'react-native';

import { bytesToHex } from '@/shared/domain';
import type { SynthPlan } from '@/shared/domain';

import { Text } from '../ui/text';
import { radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { formatHz, formatSigned } from '../ui/format';

export type SynthTableProps = { synth: SynthPlan };

/** The synthesizer settings per tone: the PLL fraction, what it really makes, its error and the register bytes. */
export function SynthTable({ synth }: SynthTableProps) {
  const { colors } = useAppTheme();
  return (
    <View style={styles.wrap}>
      <View style={styles.facts}>
        <Text>
          Output divider <Text variant="mono">{synth.outputDivider}</Text>, R divider <Text variant="mono">{synth.rDivider}</Text>,
          reference <Text variant="mono">{formatHz(synth.referenceHz, 0)}</Text>
        </Text>
        <Text variant="caption" tone="muted">
          Output divider registers
        </Text>
        <Text variant="mono" selectable style={styles.hex}>
          {bytesToHex(synth.outputRegisters.bytes)}
        </Text>
      </View>
      {synth.tones.map((tone, index) => (
        <View key={index} style={[styles.tone, { borderColor: colors.border }]}>
          <Text variant="label">Tone {index}</Text>
          <Row label="Commanded" value={formatHz(tone.targetHz, 3)} />
          <Row label="PLL fraction" value={`${tone.feedback.a} + ${tone.feedback.b}/${tone.feedback.c}`} />
          <Row label="Produced" value={formatHz(tone.producedHz, 4)} />
          <Row label="Error" value={formatSigned(tone.errorHz, 4, 'Hz')} />
          <Row label="P1 · P2 · P3" value={`${tone.registers.p1} · ${tone.registers.p2} · ${tone.registers.p3}`} />
          <Row label="Register bytes" value={bytesToHex(tone.registers.bytes)} />
        </View>
      ))}
      <Text variant="caption" tone="muted">
        Largest synthesis error: {formatSigned(synth.maxAbsErrorHz, 4, 'Hz')} (size only), far below the 1.46 Hz tone spacing.
      </Text>
    </View>
  );
}

function Row({ label, value }: { label: string; value: string }) {
  return (
    <View style={styles.row}>
      <Text variant="caption" tone="muted" style={styles.rowLabel}>
        {label}
      </Text>
      <Text variant="mono" selectable style={styles.rowValue}>
        {value}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  facts: { gap: space.xs },
  hex: { letterSpacing: 0.5 },
  tone: { borderTopWidth: 1, paddingTop: space.sm, gap: 2, borderRadius: radius.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.md },
  rowLabel: { width: 104 },
  rowValue: { flex: 1, minWidth: 180, fontSize: 13, lineHeight: 19 },
});

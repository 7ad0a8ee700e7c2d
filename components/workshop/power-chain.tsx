import { StyleSheet, View } from 'react-native';

import type { PowerChainResult } from '@/shared/domain/power';

import { Text } from '../ui/text';
import { radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { formatPowerMw, formatSigned, formatValue } from '../ui/format';

export type PowerChainProps = { power: PowerChainResult };

const stepNames: Record<string, string> = {
  'generator output': 'Generator output',
  attenuator: 'Attenuator',
  'amplifier gain': 'Amplifier gain',
  'amplifier saturation': 'Amplifier saturates at',
  'filter loss': 'Low-pass filter loss (typical)',
};

/** The power arithmetic step by step, ending in the level the WSPR message reports. */
export function PowerChain({ power }: PowerChainProps) {
  const { colors } = useAppTheme();
  const { report } = power;
  return (
    <View style={styles.wrap} accessibilityLabel="Power arithmetic">
      {power.steps.map((step, index) => (
        <View key={`${step.label}-${index}`} style={[styles.row, { borderColor: colors.border }]}>
          <Text style={styles.name}>{stepNames[step.label] ?? step.label}</Text>
          <Text variant="mono" tone="muted" style={styles.change}>
            {step.changeDb === null ? '' : formatSigned(step.changeDb, 1, 'dB')}
          </Text>
          <Text variant="mono" style={styles.level}>
            {formatValue(step.levelDbm, 1, 'dBm')}
          </Text>
        </View>
      ))}
      <View style={[styles.row, styles.total, { borderColor: colors.text }]}>
        <Text variant="label" style={styles.name}>
          At the antenna
        </Text>
        <Text variant="mono" tone="muted" style={styles.change}>
          {formatPowerMw(power.outputMw)}
        </Text>
        <Text variant="mono" style={styles.level}>
          {formatValue(power.outputDbm, 1, 'dBm')}
        </Text>
      </View>
      <View style={[styles.report, { backgroundColor: colors.primarySoft }]}>
        <Text variant="label">Reported power in the message</Text>
        <Text variant="monoLarge" tone="primary">
          {report.reportedDbm} dBm
        </Text>
        <Text variant="caption" tone="muted">
          {report.rounded
            ? `WSPR carries 0–60 dBm ending in 0, 3 or 7: ${formatValue(power.outputDbm, 1, 'dBm')} is sent as the nearest level, ${report.reportedDbm} dBm (${formatSigned(report.differenceDb, 1, 'dB')}).`
            : `${report.reportedDbm} dBm is itself a level WSPR can carry.`}
          {power.saturated ? ' The amplifier is driven into saturation: its saturated output sets the level.' : ''}
        </Text>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: 0 },
  row: { flexDirection: 'row', alignItems: 'baseline', gap: space.md, paddingVertical: space.sm, borderBottomWidth: 1 },
  total: { borderBottomWidth: 0, borderTopWidth: 1.5, marginTop: -1 },
  name: { flex: 1, minWidth: 0 },
  change: { width: 84, textAlign: 'right' },
  level: { width: 96, textAlign: 'right' },
  report: { marginTop: space.md, padding: space.md, borderRadius: radius.md, gap: space.xs },
});

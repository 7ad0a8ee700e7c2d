import { StyleSheet, View } from 'react-native';

import { amplifierSupply } from '@/shared/domain/bench';
import { dbmToMw, type PowerChainResult } from '@/shared/domain/power';

import { Text } from '../ui/text';
import { space } from '../ui/theme';
import { formatValue } from '../ui/format';

export type SupplyFiguresProps = {
  power: PowerChainResult;
  amplifier: { supplyV?: number; supplyA?: number } | null | undefined;
};

/** The amplifier's DC side beside the power chain: what it draws, what it turns into heat, the fuse it needs. */
export function SupplyFigures({ power, amplifier }: SupplyFiguresProps) {
  if (!amplifier) return null;
  const gainAt = power.steps.findIndex((s) => s.label === 'amplifier gain');
  if (gainAt < 1) return null;
  const driveDbm = power.steps[gainAt - 1].levelDbm;
  const outDbm = power.steps.filter((s) => s.label.startsWith('amplifier')).at(-1)!.levelDbm;
  const figures = amplifierSupply({
    rfOutputW: dbmToMw(outDbm) / 1000,
    rfDriveW: dbmToMw(driveDbm) / 1000,
    supplyV: amplifier.supplyV,
    supplyA: amplifier.supplyA,
  });
  return (
    <View style={styles.wrap} accessibilityLabel="Amplifier supply">
      <Text variant="label">Amplifier supply</Text>
      {!figures.ok ? (
        <Text tone="muted">{figures.reason}</Text>
      ) : (
        <>
          <Text variant="mono">
            DC in {formatValue(figures.dcInputW, 2, 'W')} ({formatValue(figures.supplyV ?? 0, 1, 'V')} ×{' '}
            {formatValue(figures.currentA, 2, 'A')}) · RF out {formatValue(figures.rfOutputW, 2, 'W')} · heat{' '}
            {formatValue(figures.heatW, 2, 'W')} · efficiency {formatValue(figures.efficiency * 100, 0, '%')}
          </Text>
          {figures.cautions.map((c) => (
            <Text key={c} tone={figures.needsHeatsink && c.includes('heatsink') ? 'danger' : 'muted'} variant="caption">
              {c}
            </Text>
          ))}
        </>
      )}
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: space.xs } });

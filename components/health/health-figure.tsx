import { StyleSheet, View } from 'react-native';

import { Text } from '../ui/text';

export type HealthFigureProps = { label: string; value: string; large?: boolean };

/** One reading with its caption: small on a fleet card, large on a station's own health screen. */
export function HealthFigure({ label, value, large = false }: HealthFigureProps) {
  return (
    <View style={[styles.figure, large && styles.large]}>
      <Text variant="caption" tone="muted">
        {label}
      </Text>
      <Text variant={large ? 'monoLarge' : 'mono'}>{value}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  figure: { gap: 2, minWidth: 90 },
  large: { minWidth: 110 },
});

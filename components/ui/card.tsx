import type { ReactNode } from 'react';
import { StyleSheet, View, type StyleProp, type ViewStyle } from 'react-native';

import { radius, space } from './theme';
import { useAppTheme } from './theme-provider';

export type CardProps = { children: ReactNode; tone?: 'plain' | 'signal' | 'primary'; style?: StyleProp<ViewStyle> };

export function Card({ children, tone = 'plain', style }: CardProps) {
  const { colors } = useAppTheme();
  const look = {
    plain: { backgroundColor: colors.surface, borderColor: colors.border },
    signal: { backgroundColor: colors.signalSoft, borderColor: colors.signal },
    primary: { backgroundColor: colors.primarySoft, borderColor: colors.primary },
  }[tone];
  return <View style={[styles.card, look, style]}>{children}</View>;
}

const styles = StyleSheet.create({
  card: { borderWidth: 1, borderRadius: radius.lg, padding: space.lg, gap: space.sm },
});

import { useId } from 'react';
import { StyleSheet, View } from 'react-native';
import Svg, { Circle, Defs, LinearGradient, Path, Stop } from 'react-native-svg';

import { Text } from '../ui/text';
import { space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';

export type FaintlineMarkProps = { size?: number };

/** The Faintline mark: a thin trace that fades in from nothing and lands on a warm dot. */
export function FaintlineMark({ size = 32 }: FaintlineMarkProps) {
  const { colors } = useAppTheme();
  const gradientId = `fl-trace-${useId().replace(/:/g, '')}`;
  return (
    <Svg width={size} height={size} viewBox="0 0 48 48" accessibilityElementsHidden importantForAccessibility="no">
      <Defs>
        <LinearGradient id={gradientId} x1="4" y1="38" x2="34" y2="14" gradientUnits="userSpaceOnUse">
          <Stop offset="0" stopColor={colors.primary} stopOpacity="0" />
          <Stop offset="0.55" stopColor={colors.primary} stopOpacity="0.55" />
          <Stop offset="1" stopColor={colors.primary} stopOpacity="1" />
        </LinearGradient>
      </Defs>
      <Path
        d="M4 38 C 14 38, 17 27, 24 24 S 31 17, 34 15"
        stroke={`url(#${gradientId})`}
        strokeWidth={3}
        strokeLinecap="round"
        fill="none"
      />
      <Circle cx={38} cy={12} r={5} fill={colors.signal} />
      <Circle cx={38} cy={12} r={8.5} stroke={colors.signal} strokeOpacity={0.35} strokeWidth={1.5} fill="none" />
    </Svg>
  );
}

export type WordmarkProps = { size?: 'small' | 'large' };

/** Mark + name, for the shell and the sign-in screens. */
export function Wordmark({ size = 'small' }: WordmarkProps) {
  const large = size === 'large';
  return (
    <View style={styles.row} role="img" aria-label="Faintline">
      <FaintlineMark size={large ? 44 : 28} />
      <Text variant={large ? 'display' : 'heading'} style={large ? undefined : styles.smallName}>
        Faintline
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  smallName: { fontSize: 19, letterSpacing: -0.2 },
});

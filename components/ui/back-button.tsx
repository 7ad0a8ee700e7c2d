import { useNavigation } from 'expo-router';
import { Pressable, StyleSheet } from 'react-native';
import Svg, { Path } from 'react-native-svg';

import { radius } from './theme';
import { useAppTheme } from './theme-provider';

/** The stack header's way back: a 44 × 44 px target (the library's arrow is 30 × 30), named for screen readers. */
export function BackButton() {
  const navigation = useNavigation();
  const { colors } = useAppTheme();
  return (
    <Pressable
      role="button"
      aria-label="Go back"
      onPress={() => navigation.goBack()}
      style={({ hovered }: { pressed: boolean; hovered?: boolean }) => [styles.target, hovered && { backgroundColor: colors.primarySoft }]}
    >
      <Svg width={24} height={24} viewBox="0 0 24 24" accessibilityElementsHidden importantForAccessibility="no">
        <Path d="M15 5 L8 12 L15 19" stroke={colors.primary} strokeWidth={2.2} strokeLinecap="round" strokeLinejoin="round" fill="none" />
      </Svg>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  target: { width: 44, height: 44, alignItems: 'center', justifyContent: 'center', borderRadius: radius.md, marginLeft: 4 },
});

import { ActivityIndicator, Pressable, StyleSheet, type StyleProp, type ViewStyle } from 'react-native';

import { Text } from './text';
import { fonts, radius, space } from './theme';
import { useAppTheme } from './theme-provider';

export type ButtonVariant = 'primary' | 'secondary' | 'danger' | 'ghost';

export type ButtonProps = {
  label: string;
  onPress: () => void;
  variant?: ButtonVariant;
  busy?: boolean;
  disabled?: boolean;
  /** Screen-reader label when it should say more than the visible one; it begins with the visible label (WCAG 2.5.3). */
  accessibilityLabel?: string;
  accessibilityHint?: string;
  style?: StyleProp<ViewStyle>;
};

export function Button({
  label,
  onPress,
  variant = 'primary',
  busy = false,
  disabled = false,
  accessibilityLabel,
  accessibilityHint,
  style,
}: ButtonProps) {
  const { colors } = useAppTheme();
  const look = {
    primary: { bg: colors.primary, fg: colors.onPrimary, border: colors.primary },
    secondary: { bg: 'transparent', fg: colors.primary, border: colors.primary },
    danger: { bg: colors.danger, fg: colors.onDanger, border: colors.danger },
    ghost: { bg: 'transparent', fg: colors.primary, border: 'transparent' },
  }[variant];
  const inactive = disabled || busy;
  return (
    <Pressable
      accessibilityRole="button"
      accessibilityLabel={nameWithVisibleLabel(label, accessibilityLabel)}
      accessibilityHint={accessibilityHint}
      accessibilityState={{ disabled: inactive, busy }}
      disabled={inactive}
      onPress={onPress}
      style={({ pressed, hovered }: { pressed: boolean; hovered?: boolean }) => [
        styles.base,
        { backgroundColor: look.bg, borderColor: look.border },
        // hover and press darken (never fade) the button, so its label keeps its contrast
        (pressed || hovered) && !inactive && (look.bg === 'transparent' ? { backgroundColor: colors.primarySoft } : styles.pressed),
        inactive && styles.inactive,
        style,
      ]}
    >
      {busy ? <ActivityIndicator size="small" color={look.fg} aria-hidden /> : null}
      <Text style={[styles.label, { color: look.fg }]}>{label}</Text>
    </Pressable>
  );
}

/** The accessible name always holds what is seen, so speech users can say it (axe: label-content-name-mismatch). */
export function nameWithVisibleLabel(label: string, accessibilityLabel?: string): string {
  if (!accessibilityLabel) return label;
  return accessibilityLabel.toLowerCase().includes(label.toLowerCase()) ? accessibilityLabel : `${label}: ${accessibilityLabel}`;
}

const styles = StyleSheet.create({
  base: {
    minHeight: 46,
    paddingHorizontal: space.lg,
    borderRadius: radius.md,
    borderWidth: 1.5,
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'center',
    gap: space.sm,
  },
  label: { fontFamily: fonts.medium, fontSize: 16 },
  pressed: { filter: 'brightness(0.88)' },
  inactive: { opacity: 0.55 },
});

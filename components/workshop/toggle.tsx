import { Pressable, StyleSheet, View } from 'react-native';

import { Text } from '../ui/text';
import { radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';

export type ToggleProps = {
  label: string;
  value: boolean;
  onChange: (value: boolean) => void;
  /** A line under the label: what on and off mean, or why it cannot change. */
  hint?: string;
  disabled?: boolean;
  busy?: boolean;
  /** Screen-reader label when it should differ from the visible one. */
  accessibilityLabel?: string;
};

/** An on/off switch with its label on the left; the whole row is the control. */
export function Toggle({ label, value, onChange, hint, disabled = false, busy = false, accessibilityLabel }: ToggleProps) {
  const { colors } = useAppTheme();
  const inactive = disabled || busy;
  return (
    <Pressable
      accessibilityRole="switch"
      accessibilityLabel={accessibilityLabel ?? label}
      accessibilityState={{ checked: value, disabled: inactive, busy }}
      disabled={inactive}
      onPress={() => onChange(!value)}
      style={styles.row}
    >
      <View style={styles.words}>
        <Text variant="label">{label}</Text>
        {hint ? (
          <Text variant="caption" tone="muted">
            {hint}
          </Text>
        ) : null}
      </View>
      <View style={[styles.track, { backgroundColor: value ? colors.primary : colors.border, opacity: inactive ? 0.5 : 1 }]}>
        <View style={[styles.knob, { backgroundColor: colors.surfaceRaised }, value ? styles.knobOn : null]} />
      </View>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md, minHeight: 44 },
  words: { flex: 1, gap: 2 },
  track: { width: 48, height: 28, borderRadius: radius.pill, padding: 3, justifyContent: 'center' },
  knob: { width: 22, height: 22, borderRadius: 11 },
  knobOn: { alignSelf: 'flex-end' },
});

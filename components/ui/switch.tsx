import { Pressable, StyleSheet, View } from 'react-native';

import { Text } from './text';
import { radius, space } from './theme';
import { useAppTheme } from './theme-provider';
import { onActivateKeys, pressIgnoringKeys, webProps } from './web-keys';

export type SwitchProps = {
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

/**
 * An on/off switch with its label on the left; the whole row (at least 44 px tall) is the control.
 * It is a `switch` with `aria-checked` for assistive technology; a click, Space or Enter flips it.
 */
export function Switch({ label, value, onChange, hint, disabled = false, busy = false, accessibilityLabel }: SwitchProps) {
  const { colors } = useAppTheme();
  const inactive = disabled || busy;
  const flip = () => {
    if (!inactive) onChange(!value);
  };
  return (
    <Pressable
      role="switch"
      aria-checked={value}
      aria-disabled={inactive || undefined}
      aria-busy={busy || undefined}
      accessibilityLabel={accessibilityLabel ?? label}
      accessibilityState={{ checked: value, disabled: inactive, busy }}
      disabled={inactive}
      onPress={pressIgnoringKeys(flip)}
      {...webProps({ onKeyDown: onActivateKeys(flip) })}
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
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md, minHeight: 44, borderRadius: radius.md },
  words: { flex: 1, gap: 2 },
  track: { width: 48, height: 28, borderRadius: radius.pill, padding: 3, justifyContent: 'center' },
  knob: { width: 22, height: 22, borderRadius: 11 },
  knobOn: { alignSelf: 'flex-end' },
});

import { Pressable, StyleSheet, View } from 'react-native';

import { Text } from '../ui/text';
import { radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';

export type ChipOption<T extends string> = {
  value: T;
  label: string;
  /** Screen-reader label; the visible label by default. */
  accessibilityLabel?: string;
  /** Drawn faded with a dashed edge; still pressable, so the caller can explain why it is out. */
  unavailable?: boolean;
};

export type ChipGroupProps<T extends string> = {
  label: string;
  options: readonly ChipOption<T>[];
  value: T | null;
  onPress: (option: ChipOption<T>) => void;
  showLabel?: boolean;
};

/** A radio group as wrapping chips: fits a phone where joined segments would not. */
export function ChipGroup<T extends string>({ label, options, value, onPress, showLabel = true }: ChipGroupProps<T>) {
  const { colors } = useAppTheme();
  return (
    <View style={styles.wrap}>
      {showLabel ? <Text variant="label">{label}</Text> : null}
      <View accessibilityRole="radiogroup" accessibilityLabel={label} style={styles.row}>
        {options.map((option) => {
          const on = option.value === value;
          return (
            <Pressable
              key={option.value}
              accessibilityRole="radio"
              accessibilityLabel={option.accessibilityLabel ?? option.label}
              accessibilityState={{ checked: on }}
              aria-checked={on}
              onPress={() => onPress(option)}
              style={({ hovered }: { pressed: boolean; hovered?: boolean }) => [
                styles.chip,
                {
                  borderColor: on ? colors.primary : colors.border,
                  backgroundColor: on ? colors.primary : option.unavailable ? 'transparent' : colors.surfaceRaised,
                },
                option.unavailable && styles.unavailable,
                hovered && !on && { borderColor: colors.primary },
              ]}
            >
              <Text
                variant="label"
                tone={on ? 'onPrimary' : option.unavailable ? 'muted' : 'default'}
                style={option.unavailable && !on ? styles.struck : undefined}
              >
                {option.label}
              </Text>
            </Pressable>
          );
        })}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  chip: { minHeight: 38, paddingHorizontal: space.md, borderWidth: 1.5, borderRadius: radius.pill, justifyContent: 'center' },
  unavailable: { borderStyle: 'dashed' },
  struck: { textDecorationLine: 'line-through' },
});

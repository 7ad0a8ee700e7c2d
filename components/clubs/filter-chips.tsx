import { Pressable, StyleSheet, View } from 'react-native';

import { Text } from '../ui/text';
import { radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';

export type FilterChipsProps<T extends string> = {
  label: string;
  options: { value: T; label: string; count?: number }[];
  value: T;
  onChange: (value: T) => void;
};

/** One choice out of a few, drawn as wrapping chips (a radio group for screen readers). */
export function FilterChips<T extends string>({ label, options, value, onChange }: FilterChipsProps<T>) {
  const { colors } = useAppTheme();
  return (
    <View style={styles.group}>
      <Text variant="caption" tone="muted">
        {label}
      </Text>
      <View accessibilityRole="radiogroup" accessibilityLabel={label} style={styles.row}>
        {options.map((option) => {
          const selected = option.value === value;
          const text = option.count === undefined ? option.label : `${option.label} (${option.count})`;
          return (
            <Pressable
              key={option.value}
              accessibilityRole="radio"
              accessibilityLabel={`${label}: ${option.label}`}
              accessibilityState={{ checked: selected }}
              onPress={() => onChange(option.value)}
              style={({ hovered }: { pressed: boolean; hovered?: boolean }) => [
                styles.chip,
                { borderColor: selected ? colors.primary : colors.border, backgroundColor: colors.surface },
                hovered && !selected && { backgroundColor: colors.surfaceRaised },
                selected && { backgroundColor: colors.primary },
              ]}
            >
              <Text variant="label" tone={selected ? 'onPrimary' : 'default'}>
                {text}
              </Text>
            </Pressable>
          );
        })}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: space.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  chip: {
    borderWidth: 1,
    borderRadius: radius.pill,
    paddingHorizontal: space.md,
    paddingVertical: 6,
    minHeight: 34,
    justifyContent: 'center',
  },
});

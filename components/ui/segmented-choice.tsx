import { Pressable, StyleSheet, View } from 'react-native';

import { Text } from './text';
import { radius, space } from './theme';
import { useAppTheme } from './theme-provider';

export type SegmentedChoiceProps<T extends string> = {
  label: string;
  options: { value: T; label: string }[];
  value: T;
  onChange: (value: T) => void;
};

/** A small radio group drawn as joined segments. */
export function SegmentedChoice<T extends string>({ label, options, value, onChange }: SegmentedChoiceProps<T>) {
  const { colors } = useAppTheme();
  return (
    <View accessibilityRole="radiogroup" accessibilityLabel={label} style={[styles.row, { borderColor: colors.border }]}>
      {options.map((option) => {
        const selected = option.value === value;
        return (
          <Pressable
            key={option.value}
            accessibilityRole="radio"
            accessibilityLabel={option.label}
            accessibilityState={{ checked: selected }}
            onPress={() => onChange(option.value)}
            style={[styles.segment, selected && { backgroundColor: colors.primary }]}
          >
            <Text variant="label" tone={selected ? 'onPrimary' : 'default'}>
              {option.label}
            </Text>
          </Pressable>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', borderWidth: 1, borderRadius: radius.md, padding: 3, alignSelf: 'flex-start' },
  segment: { paddingHorizontal: space.lg, paddingVertical: space.sm, borderRadius: radius.sm, minWidth: 72, alignItems: 'center' },
});

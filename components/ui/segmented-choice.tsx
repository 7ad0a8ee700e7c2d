import { Pressable, StyleSheet, View } from 'react-native';

import { Text } from './text';
import { radius, space } from './theme';
import { useAppTheme } from './theme-provider';
import { useRovingFocus } from './use-roving-focus';
import { onActivateKeys, pressIgnoringKeys, webProps, type KeyPress } from './web-keys';

export type SegmentedChoiceProps<T extends string> = {
  label: string;
  options: { value: T; label: string }[];
  value: T;
  onChange: (value: T) => void;
};

/** A small radio group drawn as joined segments: one Tab stop, the arrow keys move the choice. */
export function SegmentedChoice<T extends string>({ label, options, value, onChange }: SegmentedChoiceProps<T>) {
  const { colors } = useAppTheme();
  const roving = useRovingFocus(
    options.length,
    options.findIndex((option) => option.value === value),
    () => true,
  );
  return (
    <View role="radiogroup" aria-label={label} accessibilityLabel={label} style={[styles.row, { borderColor: colors.border }]}>
      {options.map((option, index) => {
        const selected = option.value === value;
        const choose = () => {
          roving.reach(index);
          onChange(option.value);
        };
        const activateKeys = onActivateKeys(choose);
        const onKeyDown = (event: KeyPress) => {
          const reached = roving.moveFrom(index, event.key);
          if (reached === null) return activateKeys(event);
          event.preventDefault?.();
          onChange(options[reached].value);
        };
        return (
          <Pressable
            key={option.value}
            ref={roving.bind(index) as never}
            role="radio"
            aria-checked={selected}
            accessibilityLabel={option.label}
            accessibilityState={{ checked: selected }}
            tabIndex={roving.tabIndexOf(index)}
            onPress={pressIgnoringKeys(choose)}
            {...webProps({ onKeyDown })}
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
  segment: {
    paddingHorizontal: space.lg,
    paddingVertical: space.sm,
    borderRadius: radius.sm,
    minWidth: 72,
    minHeight: 44,
    alignItems: 'center',
    justifyContent: 'center',
  },
});

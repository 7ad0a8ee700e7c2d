import { Pressable, StyleSheet, View } from 'react-native';

import { Text } from '../ui/text';
import { radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';

export type Choice<T extends string | number> = { value: T; label: string; disabled?: boolean };

type BaseProps<T extends string | number> = {
  /** The group's name, read out and shown above the chips. */
  label: string;
  options: readonly Choice<T>[];
  /** Screen-reader label of one chip; the visible label by default. */
  chipLabel?: (option: Choice<T>) => string;
  error?: string;
  hint?: string;
  showLabel?: boolean;
};

export type ChoiceChipsProps<T extends string | number> = BaseProps<T> & { value: T; onChange: (value: T) => void };
export type MultiChoiceChipsProps<T extends string | number> = BaseProps<T> & { value: readonly T[]; onChange: (value: T[]) => void };

/** One of several choices as wrapping chips (a radio group); fits a phone where joined segments would not. */
export function ChoiceChips<T extends string | number>({ value, onChange, ...rest }: ChoiceChipsProps<T>) {
  return <Chips {...rest} role="radio" isOn={(option) => option.value === value} onToggle={(option) => onChange(option.value)} />;
}

/** Any number of choices as wrapping chips (checkboxes), such as the bands a filter serves. */
export function MultiChoiceChips<T extends string | number>({ value, onChange, options, ...rest }: MultiChoiceChipsProps<T>) {
  return (
    <Chips
      {...rest}
      options={options}
      role="checkbox"
      isOn={(option) => value.includes(option.value)}
      onToggle={(option) =>
        onChange(
          value.includes(option.value)
            ? value.filter((v) => v !== option.value)
            : options.map((o) => o.value).filter((v) => v === option.value || value.includes(v)),
        )
      }
    />
  );
}

function Chips<T extends string | number>({
  label,
  options,
  chipLabel,
  error,
  hint,
  showLabel = true,
  role,
  isOn,
  onToggle,
}: BaseProps<T> & { role: 'radio' | 'checkbox'; isOn: (option: Choice<T>) => boolean; onToggle: (option: Choice<T>) => void }) {
  const { colors } = useAppTheme();
  return (
    <View style={styles.wrap}>
      {showLabel ? <Text variant="label">{label}</Text> : null}
      <View
        accessibilityRole={role === 'radio' ? 'radiogroup' : undefined}
        role={role === 'radio' ? undefined : 'group'}
        accessibilityLabel={label}
        style={styles.row}
      >
        {options.map((option) => {
          const on = isOn(option);
          return (
            <Pressable
              key={String(option.value)}
              accessibilityRole={role}
              accessibilityLabel={chipLabel ? chipLabel(option) : option.label}
              accessibilityState={{ checked: on, disabled: option.disabled }}
              disabled={option.disabled}
              onPress={() => onToggle(option)}
              style={({ hovered }: { pressed: boolean; hovered?: boolean }) => [
                styles.chip,
                { borderColor: on ? colors.primary : colors.border, backgroundColor: on ? colors.primary : colors.surfaceRaised },
                hovered && !on && { backgroundColor: colors.primarySoft },
                option.disabled && styles.disabled,
              ]}
            >
              <Text variant="label" tone={on ? 'onPrimary' : 'default'}>
                {option.label}
              </Text>
            </Pressable>
          );
        })}
      </View>
      {error ? (
        <Text variant="caption" tone="danger" accessibilityRole="alert">
          {error}
        </Text>
      ) : hint ? (
        <Text variant="caption" tone="muted">
          {hint}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  chip: {
    borderWidth: 1.5,
    borderRadius: radius.pill,
    paddingHorizontal: space.md,
    paddingVertical: 6,
    minHeight: 36,
    justifyContent: 'center',
  },
  disabled: { opacity: 0.45 },
});

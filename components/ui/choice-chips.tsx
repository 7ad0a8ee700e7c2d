import { Pressable, StyleSheet, View } from 'react-native';

import { FieldMessage } from './field-message';
import { Text } from './text';
import { radius, space } from './theme';
import { useAppTheme } from './theme-provider';
import { useRovingFocus } from './use-roving-focus';
import { onActivateKeys, pressIgnoringKeys, webProps, type KeyPress } from './web-keys';

export type Choice<T extends string | number> = {
  value: T;
  label: string;
  /** Cannot be chosen: faded, skipped by the arrow keys. */
  disabled?: boolean;
  /** Drawn faded with a dashed edge but still pressable, so the caller can explain why it is out. */
  unavailable?: boolean;
  /** Screen-reader label of this chip; the visible label by default. */
  accessibilityLabel?: string;
};

type BaseProps<T extends string | number> = {
  /** The group's name, read out and (unless showLabel is false) shown above the chips. */
  label: string;
  options: readonly Choice<T>[];
  /** Screen-reader label of one chip, for all chips at once. */
  chipLabel?: (option: Choice<T>) => string;
  error?: string;
  hint?: string;
  showLabel?: boolean;
  /** `caption`: the group's name small and muted, as above a list's filters. */
  labelVariant?: 'label' | 'caption';
};

export type ChoiceChipsProps<T extends string | number> = BaseProps<T> & { value: T | null; onChange: (value: T) => void };
export type MultiChoiceChipsProps<T extends string | number> = BaseProps<T> & { value: readonly T[]; onChange: (value: T[]) => void };

/**
 * One of several choices as wrapping chips: a radio group that is one Tab stop; the arrow keys move
 * the choice, a click, Space or Enter makes it. Fits a phone where joined segments would not.
 */
export function ChoiceChips<T extends string | number>({ value, onChange, ...rest }: ChoiceChipsProps<T>) {
  return (
    <Chips {...rest} role="radio" isOn={(option) => option.value === value} onToggle={(option) => onChange(option.value)} chooseOnArrow />
  );
}

/** Any number of choices as wrapping chips (checkboxes in a group), such as the bands a filter serves. */
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

type ChipsProps<T extends string | number> = BaseProps<T> & {
  role: 'radio' | 'checkbox';
  isOn: (option: Choice<T>) => boolean;
  onToggle: (option: Choice<T>) => void;
  /** Radio groups: an arrow key chooses the chip it reaches. */
  chooseOnArrow?: boolean;
};

function Chips<T extends string | number>({
  label,
  options,
  chipLabel,
  error,
  hint,
  showLabel = true,
  labelVariant = 'label',
  role,
  isOn,
  onToggle,
  chooseOnArrow = false,
}: ChipsProps<T>) {
  const { colors } = useAppTheme();
  const roving = useRovingFocus(
    options.length,
    options.findIndex((option) => isOn(option)),
    (index) => !options[index].disabled,
  );
  return (
    <View style={styles.wrap}>
      {showLabel ? (
        <Text variant={labelVariant} tone={labelVariant === 'caption' ? 'muted' : 'default'}>
          {label}
        </Text>
      ) : null}
      <View role={role === 'radio' ? 'radiogroup' : 'group'} aria-label={label} accessibilityLabel={label} style={styles.row}>
        {options.map((option, index) => {
          const on = isOn(option);
          const press = () => {
            if (option.disabled) return;
            roving.reach(index);
            onToggle(option);
          };
          const activateKeys = onActivateKeys(press);
          const onKeyDown = (event: KeyPress) => {
            const reached = roving.moveFrom(index, event.key);
            if (reached === null) return activateKeys(event);
            event.preventDefault?.(); // arrows would scroll the page
            if (chooseOnArrow && !isOn(options[reached])) onToggle(options[reached]);
          };
          return (
            <Pressable
              key={String(option.value)}
              ref={roving.bind(index) as never}
              role={role}
              aria-checked={on}
              aria-disabled={option.disabled || undefined}
              accessibilityLabel={option.accessibilityLabel ?? (chipLabel ? chipLabel(option) : option.label)}
              accessibilityState={{ checked: on, disabled: option.disabled }}
              tabIndex={roving.tabIndexOf(index)}
              disabled={option.disabled}
              onPress={pressIgnoringKeys(press)}
              {...webProps({ onKeyDown })}
              style={({ hovered }: { pressed: boolean; hovered?: boolean }) => [
                styles.chip,
                {
                  borderColor: on ? colors.primary : colors.border,
                  backgroundColor: on ? colors.primary : option.unavailable ? 'transparent' : colors.surfaceRaised,
                },
                option.unavailable && styles.unavailable,
                hovered && !on && { backgroundColor: colors.primarySoft },
                option.disabled && styles.disabled,
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
      <FieldMessage error={error} hint={hint} />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  // 44 × 44 px at least: a comfortable target for a finger
  chip: {
    borderWidth: 1.5,
    borderRadius: radius.pill,
    paddingHorizontal: space.md,
    paddingVertical: 6,
    minHeight: 44,
    minWidth: 44,
    alignItems: 'center',
    justifyContent: 'center',
  },
  unavailable: { borderStyle: 'dashed' },
  struck: { textDecorationLine: 'line-through' },
  disabled: { opacity: 0.45 },
});

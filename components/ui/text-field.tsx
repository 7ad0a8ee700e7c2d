import { forwardRef, useState, type ReactNode } from 'react';
import { StyleSheet, TextInput, View, type StyleProp, type TextInputProps, type ViewStyle } from 'react-native';

import { FieldMessage } from './field-message';
import { Text } from './text';
import { fonts, radius, space } from './theme';
import { useAppTheme } from './theme-provider';

export type TextFieldProps = Omit<TextInputProps, 'style'> & {
  label: string;
  error?: string;
  hint?: string;
  /** JetBrains Mono for callsigns and locators. */
  mono?: boolean;
  style?: StyleProp<ViewStyle>;
  /** Beside the label: a glossary mark for a trade word. */
  labelAccessory?: ReactNode;
};

/** The app's only text input: a label above, the input, and a hint or the field's error below it. */
export const TextField = forwardRef<TextInput, TextFieldProps>(function TextField(
  {
    label,
    error,
    hint,
    mono,
    multiline,
    style,
    onFocus,
    onBlur,
    secureTextEntry,
    autoCapitalize,
    autoCorrect,
    spellCheck,
    labelAccessory,
    ...rest
  },
  ref,
) {
  const { colors } = useAppTheme();
  const [focused, setFocused] = useState(false);
  const borderColor = error ? colors.danger : focused ? colors.focus : colors.border;
  return (
    <View style={[styles.wrap, style]}>
      {labelAccessory ? (
        <View style={styles.labelRow}>
          <Text variant="label">{label}</Text>
          {labelAccessory}
        </View>
      ) : (
        <Text variant="label">{label}</Text>
      )}
      <TextInput
        ref={ref}
        accessibilityLabel={label}
        aria-invalid={error ? true : undefined}
        placeholderTextColor={colors.textMuted}
        multiline={multiline}
        onFocus={(event) => {
          setFocused(true);
          onFocus?.(event);
        }}
        onBlur={(event) => {
          setFocused(false);
          onBlur?.(event);
        }}
        style={[
          styles.input,
          multiline && styles.multiline,
          {
            borderColor,
            color: colors.text,
            backgroundColor: colors.surfaceRaised,
            fontFamily: mono ? fonts.mono : fonts.regular,
          },
        ]}
        secureTextEntry={secureTextEntry}
        // a password is typed exactly: no spell-check, correction or capitals
        autoCapitalize={autoCapitalize ?? (secureTextEntry ? 'none' : undefined)}
        autoCorrect={autoCorrect ?? (secureTextEntry ? false : undefined)}
        spellCheck={spellCheck ?? (secureTextEntry ? false : undefined)}
        {...rest}
      />
      <FieldMessage error={error} hint={hint} />
    </View>
  );
});

const styles = StyleSheet.create({
  labelRow: { flexDirection: 'row', alignItems: 'center', marginVertical: -12 },
  wrap: { gap: space.xs },
  input: {
    minHeight: 46,
    borderWidth: 1.5,
    borderRadius: radius.md,
    paddingHorizontal: space.md,
    paddingVertical: space.sm,
    fontSize: 16,
    // the focus ring is our border colour; hide the browser's outline
    outlineWidth: 0,
  },
  multiline: { minHeight: 96, textAlignVertical: 'top' },
});

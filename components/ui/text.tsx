import { Text as RNText, StyleSheet, type TextProps as RNTextProps } from 'react-native';

import { useAppTheme } from './theme-provider';
import { fonts } from './theme';

export type TextVariant = 'display' | 'title' | 'heading' | 'body' | 'label' | 'caption' | 'mono' | 'monoLarge';
export type TextTone = 'default' | 'muted' | 'primary' | 'signal' | 'danger' | 'onPrimary';

export type TextProps = RNTextProps & { variant?: TextVariant; tone?: TextTone };

/** The app's only text primitive: Space Grotesk for words, JetBrains Mono for callsigns, locators and times. */
export function Text({ variant = 'body', tone = 'default', style, ...rest }: TextProps) {
  const { colors } = useAppTheme();
  const color = {
    default: colors.text,
    muted: colors.textMuted,
    primary: colors.primary,
    signal: colors.signal,
    danger: colors.danger,
    onPrimary: colors.onPrimary,
  }[tone];
  return <RNText style={[styles[variant], { color }, style]} {...rest} />;
}

const styles = StyleSheet.create({
  display: { fontFamily: fonts.bold, fontSize: 30, lineHeight: 36, letterSpacing: -0.5 },
  title: { fontFamily: fonts.bold, fontSize: 24, lineHeight: 30, letterSpacing: -0.3 },
  heading: { fontFamily: fonts.medium, fontSize: 18, lineHeight: 24 },
  body: { fontFamily: fonts.regular, fontSize: 16, lineHeight: 23 },
  label: { fontFamily: fonts.medium, fontSize: 14, lineHeight: 20 },
  caption: { fontFamily: fonts.regular, fontSize: 13, lineHeight: 18 },
  mono: { fontFamily: fonts.mono, fontSize: 15, lineHeight: 21 },
  monoLarge: { fontFamily: fonts.monoMedium, fontSize: 20, lineHeight: 26 },
});

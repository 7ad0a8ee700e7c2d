import { DarkTheme, DefaultTheme, type Theme } from 'expo-router';

import { fonts, type ColorScheme, type Palette } from './theme';

/** Our palette and fonts for the navigators' own chrome (stack headers, scene backgrounds). */
export function navigationTheme(scheme: ColorScheme, colors: Palette): Theme {
  const base = scheme === 'dark' ? DarkTheme : DefaultTheme;
  return {
    ...base,
    colors: {
      ...base.colors,
      primary: colors.primary,
      background: colors.background,
      card: colors.surface,
      text: colors.text,
      border: colors.border,
      notification: colors.signal,
    },
    fonts: {
      regular: { fontFamily: fonts.regular, fontWeight: '400' },
      medium: { fontFamily: fonts.medium, fontWeight: '500' },
      bold: { fontFamily: fonts.bold, fontWeight: '700' },
      heavy: { fontFamily: fonts.bold, fontWeight: '700' },
    },
  };
}

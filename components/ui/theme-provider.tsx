import { createContext, useCallback, useContext, useEffect, useMemo, useState, type ReactNode } from 'react';
import { Platform, useColorScheme } from 'react-native';

import { palettes, type ColorScheme, type Palette, type ThemePreference } from './theme';
import { readThemePreference, writeThemePreference } from './theme-storage';

type ThemeContextValue = {
  scheme: ColorScheme;
  colors: Palette;
  preference: ThemePreference;
  setPreference: (preference: ThemePreference) => void;
};

const ThemeContext = createContext<ThemeContextValue | null>(null);

export type AppThemeProviderProps = { children: ReactNode; initialPreference?: ThemePreference };

/** Follows the system scheme unless the operator picked one in Settings (kept in localStorage on web). */
export function AppThemeProvider({ children, initialPreference }: AppThemeProviderProps) {
  const system = useColorScheme();
  const [preference, setPreferenceState] = useState<ThemePreference>(() => initialPreference ?? readThemePreference());
  const setPreference = useCallback((next: ThemePreference) => {
    writeThemePreference(next);
    setPreferenceState(next);
  }, []);
  const scheme: ColorScheme = preference === 'system' ? (system === 'dark' ? 'dark' : 'light') : preference;
  // the page behind the app (overscroll, scrollbars, form controls) follows the scheme too
  useEffect(() => {
    if (Platform.OS !== 'web' || typeof document === 'undefined') return;
    document.documentElement.style.colorScheme = scheme;
    document.body.style.backgroundColor = palettes[scheme].background;
  }, [scheme]);
  const value = useMemo(() => ({ scheme, colors: palettes[scheme], preference, setPreference }), [scheme, preference, setPreference]);
  return <ThemeContext.Provider value={value}>{children}</ThemeContext.Provider>;
}

export function useAppTheme(): ThemeContextValue {
  const value = useContext(ThemeContext);
  if (!value) throw new Error('useAppTheme needs <AppThemeProvider> above it');
  return value;
}

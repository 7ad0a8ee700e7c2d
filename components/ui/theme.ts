/** Design tokens: Faintline's own palette, type and spacing. Light "daylight paper", dark "night ink". */

export type ColorScheme = 'light' | 'dark';
export type ThemePreference = 'system' | ColorScheme;

export type Palette = {
  background: string;
  surface: string;
  surfaceRaised: string;
  border: string;
  text: string;
  textMuted: string;
  /** Deep teal: primary actions, links, the selected tab. */
  primary: string;
  onPrimary: string;
  primarySoft: string;
  /** Warm signal amber: the mark's dot, the live clock, highlights. */
  signal: string;
  signalSoft: string;
  onSignal: string;
  danger: string;
  onDanger: string;
  dangerSoft: string;
  focus: string;
  overlay: string;
};

export const palettes: Record<ColorScheme, Palette> = {
  light: {
    background: '#F3F0E8',
    surface: '#FFFDF8',
    surfaceRaised: '#FFFFFF',
    border: '#D8D1C3',
    text: '#10201F',
    textMuted: '#4E615F',
    primary: '#0F6760',
    onPrimary: '#FFFFFF',
    primarySoft: '#DCEBE7',
    signal: '#9A4A0C',
    signalSoft: '#F6E4D2',
    onSignal: '#FFFFFF',
    danger: '#A63A2B',
    onDanger: '#FFFFFF',
    dangerSoft: '#F6DFDA',
    focus: '#0F6760',
    overlay: 'rgba(16, 32, 31, 0.45)',
  },
  dark: {
    background: '#0A1416',
    surface: '#0F1D20',
    surfaceRaised: '#15272B',
    border: '#23393E',
    text: '#E4EEEC',
    textMuted: '#93ABA8',
    primary: '#5CC2B4',
    onPrimary: '#06201D',
    primarySoft: '#143632',
    signal: '#F2A65A',
    signalSoft: '#3A2915',
    onSignal: '#1E1206',
    danger: '#F08A76',
    onDanger: '#2A0D07',
    dangerSoft: '#3A1A15',
    focus: '#F2A65A',
    overlay: 'rgba(2, 8, 9, 0.7)',
  },
};

/** Font family names as registered by expo-font in the root layout. */
export const fonts = {
  regular: 'SpaceGrotesk_400Regular',
  medium: 'SpaceGrotesk_500Medium',
  bold: 'SpaceGrotesk_700Bold',
  mono: 'JetBrainsMono_400Regular',
  monoMedium: 'JetBrainsMono_500Medium',
} as const;

export const space = { xs: 4, sm: 8, md: 12, lg: 16, xl: 24, xxl: 32, xxxl: 48 } as const;
export const radius = { sm: 6, md: 10, lg: 16, pill: 999 } as const;

export const layout = {
  /** Content column cap on wide screens. */
  maxContentWidth: 960,
  /** Auth card cap. */
  maxFormWidth: 440,
  /** Bottom tab bar height on phones (taller than the default so labels do not clip). */
  tabBarHeight: 56,
  sideRailWidth: 232,
} as const;

export const breakpoints = { tablet: 768, wide: 1024 } as const;

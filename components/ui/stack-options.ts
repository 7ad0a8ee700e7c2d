import { fonts } from './theme';
import { useAppTheme } from './theme-provider';

/** The header and background every feature stack uses, in the current theme. */
export function useStackScreenOptions() {
  const { colors } = useAppTheme();
  return {
    headerStyle: { backgroundColor: colors.background },
    headerShadowVisible: false,
    headerTintColor: colors.primary,
    headerTitleStyle: { fontFamily: fonts.medium, color: colors.text },
    contentStyle: { backgroundColor: colors.background },
  };
}

import { StyleSheet } from 'react-native';

import { BackButton } from './back-button';
import { Heading } from './heading';
import { Text } from './text';
import { fonts } from './theme';
import { useAppTheme } from './theme-provider';

/** The stack header's title is the screen's level-1 heading, unless the screen shows a `ScreenTitle` of its own. */
function HeaderHeading({ children }: { children: string }) {
  return (
    <Heading level={1} numberOfLines={1} style={styles.title}>
      {children}
    </Heading>
  );
}

/** The header's title as a plain label, for a screen whose `ScreenTitle` is its heading. */
export function HeaderLabel({ children }: { children: string }) {
  return (
    <Text numberOfLines={1} style={styles.title}>
      {children}
    </Text>
  );
}

/** The header and background every feature stack uses, in the current theme. */
export function useStackScreenOptions() {
  const { colors } = useAppTheme();
  return {
    headerStyle: { backgroundColor: colors.background },
    headerShadowVisible: false,
    headerTintColor: colors.primary,
    headerTitle: HeaderHeading,
    headerLeft: ({ canGoBack }: { canGoBack?: boolean }) => (canGoBack ? <BackButton /> : null),
    headerTitleStyle: { fontFamily: fonts.medium, color: colors.text },
    contentStyle: { backgroundColor: colors.background },
  };
}

const styles = StyleSheet.create({ title: { fontFamily: fonts.medium, fontSize: 17, lineHeight: 22 } });

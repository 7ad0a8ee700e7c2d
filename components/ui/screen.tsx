import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View, type StyleProp, type ViewStyle } from 'react-native';

import { useBreakpoints } from './breakpoints';
import { layout, space } from './theme';
import { useAppTheme } from './theme-provider';

export type ScreenProps = {
  children: ReactNode;
  /** Column cap; defaults to the content width. */
  maxWidth?: number;
  /** Things drawn over the scrolling content, such as a confirm dialog. */
  overlay?: ReactNode;
  contentStyle?: StyleProp<ViewStyle>;
};

/** A scrolling page with a centred content column, capped on wide screens; the `main` landmark of its screen. */
export function Screen({ children, maxWidth = layout.maxContentWidth, overlay, contentStyle }: ScreenProps) {
  const { colors } = useAppTheme();
  const { isTablet } = useBreakpoints();
  return (
    <View role="main" style={[styles.root, { backgroundColor: colors.background }]}>
      <ScrollView
        style={styles.root}
        contentContainerStyle={[styles.scroll, { padding: isTablet ? space.xxl : space.lg }]}
        keyboardShouldPersistTaps="handled"
      >
        <View style={[styles.column, { maxWidth }, contentStyle]}>{children}</View>
      </ScrollView>
      {overlay}
    </View>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1 },
  scroll: { flexGrow: 1, alignItems: 'center' },
  column: { width: '100%', gap: space.lg },
});

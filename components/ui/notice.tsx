import { StyleSheet, View } from 'react-native';

import { Text } from './text';
import { radius, space } from './theme';
import { useAppTheme } from './theme-provider';

export type NoticeProps = { message: string; tone?: 'error' | 'info' | 'success' };

/** A form-level or page-level message; errors are announced to screen readers. */
export function Notice({ message, tone = 'error' }: NoticeProps) {
  const { colors } = useAppTheme();
  const look = {
    error: { backgroundColor: colors.dangerSoft, borderColor: colors.danger },
    info: { backgroundColor: colors.signalSoft, borderColor: colors.signal },
    success: { backgroundColor: colors.primarySoft, borderColor: colors.primary },
  }[tone];
  return (
    <View style={[styles.box, look]} accessibilityRole={tone === 'error' ? 'alert' : undefined} accessibilityLiveRegion="polite">
      <Text variant="label">{message}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderWidth: 1, borderLeftWidth: 4, borderRadius: radius.md, padding: space.md },
});

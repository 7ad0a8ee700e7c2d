import { useEffect, useRef } from 'react';
import { Platform, StyleSheet, View } from 'react-native';

import { Text } from './text';
import { radius, space } from './theme';
import { useAppTheme } from './theme-provider';

export type NoticeProps = { message: string; tone?: 'error' | 'info' | 'success' };

/**
 * A form-level or page-level message. Errors are announced as alerts, successes ("Saved.") as a status; both
 * scroll into view when they appear below the fold, so the result of a press is never out of sight.
 */
export function Notice({ message, tone = 'error' }: NoticeProps) {
  const { colors } = useAppTheme();
  const box = useRef<View>(null);
  useEffect(() => {
    if (tone === 'info' || Platform.OS !== 'web') return;
    const node = box.current as unknown as { scrollIntoView?: (options: ScrollIntoViewOptions) => void } | null;
    node?.scrollIntoView?.({ block: 'nearest', behavior: 'smooth' });
  }, [tone, message]);
  const look = {
    error: { backgroundColor: colors.dangerSoft, borderColor: colors.danger },
    info: { backgroundColor: colors.signalSoft, borderColor: colors.signal },
    success: { backgroundColor: colors.primarySoft, borderColor: colors.primary },
  }[tone];
  return (
    <View
      ref={box}
      style={[styles.box, look]}
      role={tone === 'error' ? 'alert' : tone === 'success' ? 'status' : undefined}
      aria-live="polite"
    >
      <Text variant="label">{message}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderWidth: 1, borderLeftWidth: 4, borderRadius: radius.md, padding: space.md },
});

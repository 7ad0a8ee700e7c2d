import type { ReactNode } from 'react';
import { ActivityIndicator, StyleSheet, View } from 'react-native';

import { Button } from './button';
import { Card } from './card';
import { Text } from './text';
import { space } from './theme';
import { useAppTheme } from './theme-provider';

export function LoadingState({ label = 'Loading…' }: { label?: string }) {
  const { colors } = useAppTheme();
  return (
    <View style={styles.center} accessibilityRole="progressbar" accessibilityLabel={label}>
      {/* the spinner is drawing only: the view around it is the named progress bar */}
      <ActivityIndicator color={colors.primary} aria-hidden />
      <Text tone="muted">{label}</Text>
    </View>
  );
}

export type ErrorStateProps = { title?: string; error: unknown; onRetry?: () => void };

export function ErrorState({ title = 'Something went wrong', error, onRetry }: ErrorStateProps) {
  const message = error instanceof Error ? error.message : 'An unexpected error happened.';
  return (
    <Card style={styles.block}>
      <Text variant="heading">{title}</Text>
      <Text tone="muted" accessibilityRole="alert">
        {message}
      </Text>
      {onRetry ? <Button label="Try again" variant="secondary" onPress={onRetry} style={styles.action} /> : null}
    </Card>
  );
}

export type EmptyStateProps = { title: string; message: string; action?: ReactNode };

export function EmptyState({ title, message, action }: EmptyStateProps) {
  return (
    <Card style={styles.block}>
      <Text variant="heading">{title}</Text>
      <Text tone="muted">{message}</Text>
      {action ? <View style={styles.action}>{action}</View> : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  center: { paddingVertical: space.xxl, alignItems: 'center', gap: space.md },
  block: { alignItems: 'flex-start' },
  action: { marginTop: space.sm, alignSelf: 'flex-start' },
});

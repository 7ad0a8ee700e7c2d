import { ActivityIndicator, StyleSheet, View } from 'react-native';

import { FaintlineMark } from '../brand/faintline-mark';
import { ErrorState } from '../ui/query-states';
import { layout, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';

export type BootScreenProps = { error?: unknown; onRetry?: () => void };

/** Shown while fonts and the session load: neutral, so neither signed-in nor signed-out screens flash. */
export function BootScreen({ error, onRetry }: BootScreenProps) {
  const { colors } = useAppTheme();
  return (
    <View style={[styles.root, { backgroundColor: colors.background }]}>
      <FaintlineMark size={56} />
      {error ? (
        <View style={styles.error}>
          <ErrorState title="Faintline could not start" error={error} onRetry={onRetry} />
        </View>
      ) : (
        <ActivityIndicator color={colors.primary} accessibilityLabel="Starting Faintline" />
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1, alignItems: 'center', justifyContent: 'center', gap: space.xl, padding: space.lg },
  error: { width: '100%', maxWidth: layout.maxFormWidth },
});

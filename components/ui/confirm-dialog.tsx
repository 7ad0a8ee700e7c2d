import { useEffect } from 'react';
import { Platform, Pressable, StyleSheet, View } from 'react-native';

import { Button } from './button';
import { Text } from './text';
import { radius, space } from './theme';
import { useAppTheme } from './theme-provider';

export type ConfirmDialogProps = {
  visible: boolean;
  title: string;
  message: string;
  confirmLabel: string;
  cancelLabel?: string;
  destructive?: boolean;
  busy?: boolean;
  error?: string;
  onConfirm: () => void;
  onCancel: () => void;
};

/**
 * Asks before an action that cannot be undone. Drawn as an overlay of the screen
 * (put it in `<Screen overlay>`), so it works the same in the browser and in tests.
 */
export function ConfirmDialog({
  visible,
  title,
  message,
  confirmLabel,
  cancelLabel = 'Cancel',
  destructive = false,
  busy = false,
  error,
  onConfirm,
  onCancel,
}: ConfirmDialogProps) {
  const { colors } = useAppTheme();
  // Escape closes the dialog in the browser, as people expect of a dialog
  useEffect(() => {
    if (!visible || busy || Platform.OS !== 'web' || typeof document === 'undefined') return;
    const onKey = (event: KeyboardEvent) => {
      if (event.key === 'Escape') onCancel();
    };
    document.addEventListener('keydown', onKey);
    return () => document.removeEventListener('keydown', onKey);
  }, [visible, busy, onCancel]);
  if (!visible) return null;
  return (
    <View style={[StyleSheet.absoluteFill, styles.backdrop, { backgroundColor: colors.overlay }]}>
      <Pressable
        style={StyleSheet.absoluteFill}
        accessibilityRole="button"
        accessibilityLabel="Close the dialog"
        onPress={busy ? undefined : onCancel}
      />
      <View
        role="alertdialog"
        aria-modal
        aria-label={title}
        style={[styles.dialog, { backgroundColor: colors.surfaceRaised, borderColor: colors.border }]}
      >
        <Text variant="heading">{title}</Text>
        <Text tone="muted">{message}</Text>
        {error ? (
          <Text tone="danger" accessibilityRole="alert">
            {error}
          </Text>
        ) : null}
        <View style={styles.actions}>
          <Button label={cancelLabel} variant="ghost" onPress={onCancel} disabled={busy} />
          <Button label={confirmLabel} variant={destructive ? 'danger' : 'primary'} onPress={onConfirm} busy={busy} />
        </View>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  backdrop: { alignItems: 'center', justifyContent: 'center', padding: space.lg },
  dialog: {
    width: '100%',
    maxWidth: 420,
    borderWidth: 1,
    borderRadius: radius.lg,
    padding: space.xl,
    gap: space.md,
  },
  actions: { flexDirection: 'row', justifyContent: 'flex-end', gap: space.sm, flexWrap: 'wrap' },
});

import { useLayoutEffect, useRef, useState } from 'react';
import { Modal, Platform, Pressable, StyleSheet, View } from 'react-native';

import { Button } from './button';
import { Text } from './text';
import { radius, space } from './theme';
import { useAppTheme } from './theme-provider';
import { useDialogFocus } from './use-dialog-focus';

export type ConfirmDialogProps = {
  visible: boolean;
  title: string;
  message: string;
  /** What else the action takes with it, listed under the message. */
  details?: readonly string[];
  confirmLabel: string;
  cancelLabel?: string;
  destructive?: boolean;
  busy?: boolean;
  error?: string;
  onConfirm: () => void;
  onCancel: () => void;
};

/**
 * Asks before an action that cannot be undone. Drawn in a modal layer over the whole window (side rail and
 * top bar included); in the browser focus moves in, stays in, and returns to the opener on close, and
 * Escape cancels from any field.
 */
export function ConfirmDialog({
  visible,
  title,
  message,
  details,
  confirmLabel,
  cancelLabel = 'Cancel',
  destructive = false,
  busy = false,
  error,
  onConfirm,
  onCancel,
}: ConfirmDialogProps) {
  const { colors } = useAppTheme();
  const box = useRef<View>(null);
  const anchor = useRef<View>(null);
  // A modal layer needs a real document (or a native app); a test renderer's tree gets the dialog in place
  const [layered, setLayered] = useState(Platform.OS !== 'web');
  useLayoutEffect(() => {
    if (typeof HTMLElement !== 'undefined' && anchor.current instanceof HTMLElement) setLayered(true);
  }, []);
  useDialogFocus(visible, box);
  const cancel = () => {
    if (!busy) onCancel();
  };
  const placeholder = <View ref={anchor} style={styles.anchor} />;
  if (!visible) return placeholder;
  const layer = (
    <View style={[StyleSheet.absoluteFill, styles.backdrop, { backgroundColor: colors.overlay }]}>
      {/* A pointer convenience only: Escape and Cancel are the ways for keyboards and screen readers. */}
      <Pressable style={StyleSheet.absoluteFill} focusable={false} aria-hidden onPress={cancel} />
      <View
        ref={box}
        role="alertdialog"
        aria-modal
        aria-label={title}
        style={[styles.dialog, { backgroundColor: colors.surfaceRaised, borderColor: colors.border }]}
      >
        <Text variant="heading">{title}</Text>
        <Text tone="muted">{message}</Text>
        {details?.length ? (
          <View role="list">
            {details.map((line) => (
              <Text key={line} role="listitem" tone="muted">
                {'• '}
                {line}
              </Text>
            ))}
          </View>
        ) : null}
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
  if (!layered) return layer;
  return (
    <>
      {placeholder}
      <Modal visible transparent animationType="none" onRequestClose={cancel} aria-label={title}>
        {layer}
      </Modal>
    </>
  );
}

const styles = StyleSheet.create({
  anchor: { display: 'none' },
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

import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect } from 'react';
import { useForm } from 'react-hook-form';
import { Platform, Pressable, StyleSheet, View } from 'react-native';
import type { z } from 'zod';

import { suspensionInput } from '@/shared/schemas';

import { serverMessage, submitWithServerErrors } from '../form/apply-server-errors';
import { FormTextField } from '../form/form-text-field';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';
import { Text } from '../ui/text';
import { radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';

export type SuspensionReason = z.infer<typeof suspensionInput>;
export type SuspendDialogProps = {
  /** The station to stop, or null when the dialog is closed. */
  station: { name: string; ownerName: string } | null;
  onConfirm: (values: SuspensionReason) => Promise<unknown>;
  onCancel: () => void;
};

/** Asks for the reason before a club admin stops a member's station (drawn as an overlay of the screen). */
export function SuspendDialog({ station, onConfirm, onCancel }: SuspendDialogProps) {
  const { colors } = useAppTheme();
  const form = useForm<SuspensionReason>({ resolver: zodResolver(suspensionInput), defaultValues: { reason: '' } });
  const busy = form.formState.isSubmitting;
  useEffect(() => {
    if (station) form.reset({ reason: '' });
  }, [station, form]);
  useEffect(() => {
    if (!station || busy || Platform.OS !== 'web' || typeof document === 'undefined') return;
    const onKey = (event: KeyboardEvent) => {
      if (event.key === 'Escape') onCancel();
    };
    document.addEventListener('keydown', onKey);
    return () => document.removeEventListener('keydown', onKey);
  }, [station, busy, onCancel]);
  if (!station) return null;
  const submit = submitWithServerErrors(form, onConfirm);
  const rootError = serverMessage(form.formState.errors);
  const title = `Suspend ${station.name}?`;
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
        <Text tone="muted">
          The station stops sending: its plan empties and its device settings say it is suspended. {station.ownerName} gets an e-mail with
          your reason. You can lift it again at any time.
        </Text>
        <FormTextField control={form.control} name="reason" label="Reason (the owner sees this)" multiline autoFocus />
        {rootError ? <Notice message={rootError} /> : null}
        <View style={styles.actions}>
          <Button label="Cancel" variant="ghost" onPress={onCancel} disabled={busy} />
          <Button label="Suspend station" variant="danger" onPress={submit} busy={busy} />
        </View>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  backdrop: { alignItems: 'center', justifyContent: 'center', padding: space.lg },
  dialog: { width: '100%', maxWidth: 460, borderWidth: 1, borderRadius: radius.lg, padding: space.xl, gap: space.md },
  actions: { flexDirection: 'row', justifyContent: 'flex-end', gap: space.sm, flexWrap: 'wrap' },
});

import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { alertSettingsInput, type AlertSettings } from '@/shared/schemas';

import { serverMessage } from '../form/apply-server-errors';
import { NumberField } from '../form/number-field';
import { numberFieldErrors } from '../form/number-text';
import { useSaveSubmit } from '../form/use-save-submit';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';
import { Text } from '../ui/text';
import { space } from '../ui/theme';

export type AlertSettingsFormProps = {
  settings: AlertSettings;
  onSubmit: (values: AlertSettings) => Promise<unknown>;
  /** a club admin sees the thresholds but cannot change them */
  readOnly?: boolean;
};

/** When the server should raise an alert for this station: how long silent, how far off the clock. */
export function AlertSettingsForm({ settings, onSubmit, readOnly = false }: AlertSettingsFormProps) {
  const form = useForm<AlertSettings>({ resolver: zodResolver(alertSettingsInput, { error: numberFieldErrors }), defaultValues: settings });
  const { submit, saved } = useSaveSubmit(form, onSubmit);
  if (readOnly) {
    return (
      <View style={styles.form}>
        <Text>
          Alert after <Text variant="mono">{settings.silentMinutes} min</Text> of silence while scheduled, or a clock more than{' '}
          <Text variant="mono">{settings.clockOffsetMs} ms</Text> off.
        </Text>
        <Text variant="caption" tone="muted">
          Only the station's owner can change these thresholds.
        </Text>
      </View>
    );
  }
  const rootMessage = serverMessage(form.formState.errors);
  return (
    <View style={styles.form}>
      {rootMessage ? <Notice message={rootMessage} /> : null}
      <NumberField
        control={form.control}
        name="silentMinutes"
        inputMode="numeric"
        label="Silent for (minutes)"
        hint="Alert when the device has not reported for this long while it is scheduled to transmit."
      />
      <NumberField
        control={form.control}
        name="clockOffsetMs"
        inputMode="numeric"
        label="Clock offset limit (ms)"
        hint="Alert when the device clock is further off UTC than this. Decoding tolerates only a couple of seconds: aim well under one."
      />
      {saved ? <Notice tone="success" message="Thresholds saved. The next alert round uses them." /> : null}
      <Button label="Save thresholds" onPress={submit} busy={form.formState.isSubmitting} style={styles.submit} />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.md },
  submit: { alignSelf: 'flex-start' },
});

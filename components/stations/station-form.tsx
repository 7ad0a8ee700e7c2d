import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'expo-router';
import { useController, useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import type { z } from 'zod';

import { LICENCE_REGIONS, type LicenceRegion } from '@/shared/domain/bands';
import { regionLabels, stationInput, type Unit } from '@/shared/schemas';

import { enterSubmits } from '../form/enter-submits';
import { applyServerErrors, serverMessage } from '../form/apply-server-errors';
import { FormTextField } from '../form/form-text-field';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';
import { Text } from '../ui/text';
import { space } from '../ui/theme';
import { ChoiceChips } from '../ui/choice-chips';
import { NumberField } from '../form/number-field';
import { numberFieldErrors } from '../form/number-text';
import { LocatorHelper } from '../workshop/locator-helper';
import { Switch } from '../ui/switch';
import { keepStationDraft } from './station-draft';
import { TermInfo } from '../help/term-info';

type StationFields = z.input<typeof stationInput>;
/** What the form hands over: its own four fields, trimmed and upper-cased by the shared schema. */
export type StationFormValues = Pick<z.output<typeof stationInput>, 'name' | 'callsign' | 'locator' | 'notes'> &
  Partial<Pick<z.output<typeof stationInput>, 'unitId' | 'region' | 'audioOffsetHz' | 'transmitEnabled'>>;

export type StationFormProps = {
  defaultValues?: Partial<StationFields>;
  submitLabel?: string;
  onSubmit: (values: StationFormValues) => Promise<unknown>;
  onCancel?: () => void;
  /** The operator's units: given, the form also sets the station's unit, licence region, audio offset and transmit switch. */
  units?: Unit[];
};

export function StationForm({ defaultValues, submitLabel = 'Save station', onSubmit, onCancel, units }: StationFormProps) {
  const form = useForm<StationFields, unknown, z.output<typeof stationInput>>({
    resolver: zodResolver(stationInput, { error: numberFieldErrors }),
    defaultValues: {
      name: '',
      callsign: '',
      locator: '',
      notes: '',
      ...(units ? { unitId: null, region: 'itu1', audioOffsetHz: 1500, transmitEnabled: false } : {}),
      ...defaultValues,
    },
  });
  const submit = form.handleSubmit(async ({ name, callsign, locator, notes, unitId, region, audioOffsetHz, transmitEnabled }) => {
    try {
      // only the fields shown here: an edit must not reset settings made elsewhere to schema defaults
      await onSubmit(
        units ? { name, callsign, locator, notes, unitId, region, audioOffsetHz, transmitEnabled } : { name, callsign, locator, notes },
      );
    } catch (error) {
      applyServerErrors(form, error);
    }
  });
  enterSubmits(form.control, submit);
  const message = serverMessage(form.formState.errors);
  return (
    <View style={styles.form}>
      {message ? <Notice message={message} /> : null}
      <FormTextField control={form.control} name="name" label="Name" hint="Your own name for it, such as “Loft beacon”." />
      <FormTextField
        control={form.control}
        name="callsign"
        label="Callsign"
        hint="The licensed callsign it transmits, for example Q1ABC or Q1ABC/P."
        upperCase
        mono
        autoCorrect={false}
      />
      <FormTextField
        control={form.control}
        name="locator"
        label="Locator"
        hint="Maidenhead locator, 4 or 6 characters, for example IO91 or IO91wm."
        mono
        autoCorrect={false}
        autoCapitalize="characters"
      />
      <LocatorHelper onLocator={(locator) => form.setValue('locator', locator, { shouldValidate: true, shouldDirty: true })} />
      {units ? <StationSetupFields form={form} units={units} /> : null}
      <FormTextField control={form.control} name="notes" label="Notes" multiline numberOfLines={4} />
      <View style={styles.actions}>
        <Button label={submitLabel} onPress={submit} busy={form.formState.isSubmitting} />
        {onCancel ? <Button label="Cancel" variant="ghost" onPress={onCancel} /> : null}
      </View>
    </View>
  );
}

type StationFormApi = ReturnType<typeof useForm<StationFields, unknown, z.output<typeof stationInput>>>;

/** The workshop part of the form: which unit, licence region, audio offset and the transmit switch. */
function StationSetupFields({ form, units }: { form: StationFormApi; units: Unit[] }) {
  const router = useRouter();
  const unit = useController({ control: form.control, name: 'unitId' });
  const region = useController({ control: form.control, name: 'region' });
  const transmit = useController({ control: form.control, name: 'transmitEnabled' });
  return (
    <>
      {units.length ? (
        <ChoiceChips<number>
          label="Unit"
          options={[{ value: 0, label: 'No unit' }, ...units.map((u) => ({ value: u.id, label: u.name }))]}
          chipLabel={(option) => (option.value === 0 ? 'No unit' : `Unit ${option.label}`)}
          value={(unit.field.value as number | null | undefined) ?? 0}
          onChange={(value) => unit.field.onChange(value === 0 ? null : value)}
          error={unit.fieldState.error?.message}
          hint="The beacon hardware this station runs on; its filters decide which bands can be enabled."
        />
      ) : (
        <View style={styles.noUnit}>
          <Text tone="muted">
            No units registered yet. A station needs the beacon hardware it runs on before any band can be enabled. Register it first: what
            you typed here is kept and comes back when the unit is saved.
          </Text>
          <Button
            label="Register a unit first"
            variant="secondary"
            onPress={() => {
              keepStationDraft(form.getValues());
              router.push({ pathname: '/units/new', params: { then: 'new-station' } });
            }}
          />
        </View>
      )}
      <ChoiceChips<LicenceRegion>
        label="Licence region"
        options={LICENCE_REGIONS.map((value) => ({ value, label: regionLabels[value] }))}
        value={(region.field.value as LicenceRegion | undefined) ?? 'itu1'}
        onChange={(value) => region.field.onChange(value)}
        error={region.fieldState.error?.message}
        hint="Sets the band plan and the harmonic limit used for this station."
      />
      <NumberField
        control={form.control}
        name="audioOffsetHz"
        label="Audio offset (Hz)"
        labelAccessory={<TermInfo term="audio-offset" />}
        hint="Where in the 1400–1600 Hz window above the dial frequency the signal sits; 1500 is the middle."
      />
      <Switch
        label="Transmit enabled"
        value={!!transmit.field.value}
        onChange={(value) => transmit.field.onChange(value)}
        hint="Only with a valid licence and your own callsign, and only on bands with the right low-pass filter."
      />
    </>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  actions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
  noUnit: { gap: space.sm, alignItems: 'flex-start' },
});

import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useController, useForm, useWatch, type Control } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { serverMessage, submitWithServerErrors } from '../form/apply-server-errors';
import { FormTextField } from '../form/form-text-field';
import { bandName } from '../receptions/format';
import { Button } from '../ui/button';
import { ChoiceChips } from '../ui/choice-chips';
import { Notice } from '../ui/notice';
import { SegmentedChoice } from '../ui/segmented-choice';
import { Text } from '../ui/text';
import { space } from '../ui/theme';
import { compareDefaults, compareFormSchema, requestOf, type CompareFormValues } from './compare-form-values';
import type { ComparableStation, ComparisonRequest } from './queries';

export type CompareFormProps = {
  stations: ComparableStation[];
  /** the station to start with as A (from a results screen), if any */
  startWith: number | null;
  onCompare: (request: ComparisonRequest) => Promise<unknown>;
};

function StationChips({
  control,
  name,
  label,
  stations,
}: {
  control: Control<CompareFormValues>;
  name: 'a' | 'b';
  label: string;
  stations: ComparableStation[];
}) {
  const { field, fieldState } = useController({ control, name });
  return (
    <ChoiceChips<number>
      label={label}
      options={stations.map((s) => ({ value: s.id, label: `${s.name} · ${s.callsign}${s.ownerName ? ` (${s.ownerName})` : ''}` }))}
      chipLabel={(option) => `${label}: ${option.label}`}
      value={field.value ?? null}
      onChange={field.onChange}
      error={fieldState.error?.message}
    />
  );
}

function TimeFields({
  control,
  from,
  to,
  label,
}: {
  control: Control<CompareFormValues>;
  from: 'from' | 'aFrom' | 'bFrom';
  to: 'to' | 'aTo' | 'bTo';
  label: string;
}) {
  return (
    <View style={styles.group}>
      <Text variant="label">{label}</Text>
      <View style={styles.times}>
        <FormTextField control={control} name={from} label="From (UTC)" hint="YYYY-MM-DD HH:MM" mono style={styles.field} />
        <FormTextField control={control} name={to} label="To (UTC)" hint="YYYY-MM-DD HH:MM" mono style={styles.field} />
      </View>
    </View>
  );
}

/** Choose two stations over one period, or one station over two periods, and a band. */
export function CompareForm({ stations, startWith, onCompare }: CompareFormProps) {
  const [defaults] = useState(() => compareDefaults(Date.now(), startWith));
  const form = useForm<CompareFormValues>({ resolver: zodResolver(compareFormSchema), defaultValues: defaults });
  const [mode, a, b] = useWatch({ control: form.control, name: ['mode', 'a', 'b'] });
  const modeField = useController({ control: form.control, name: 'mode' });
  const band = useController({ control: form.control, name: 'band' });
  const picked = stations.filter((s) => s.id === a || (mode === 'two-stations' && s.id === b));
  const bandIds = [...new Set((picked.length ? picked : stations).flatMap((s) => s.bandIds))];
  const submit = submitWithServerErrors(form, (values) => onCompare(requestOf(values)));
  const rootError = serverMessage(form.formState.errors);
  return (
    <View style={styles.form}>
      <SegmentedChoice
        label="What to compare"
        options={[
          { value: 'two-stations', label: 'Two stations' },
          { value: 'two-periods', label: 'One station, two periods' },
        ]}
        value={mode}
        onChange={modeField.field.onChange}
      />
      <StationChips control={form.control} name="a" label={mode === 'two-stations' ? 'Station A' : 'Station'} stations={stations} />
      {mode === 'two-stations' ? <StationChips control={form.control} name="b" label="Station B" stations={stations} /> : null}
      <ChoiceChips<string>
        label="Band"
        options={bandIds.map((id) => ({ value: id, label: bandName(id) }))}
        value={band.field.value ?? null}
        onChange={band.field.onChange}
        error={band.fieldState.error?.message}
        hint={bandIds.length === 0 ? 'The chosen stations have no bands enabled.' : undefined}
      />
      {mode === 'two-stations' ? (
        <TimeFields control={form.control} from="from" to="to" label="Period (UTC)" />
      ) : (
        <>
          <TimeFields control={form.control} from="aFrom" to="aTo" label="Period A (UTC)" />
          <TimeFields control={form.control} from="bFrom" to="bTo" label="Period B (UTC)" />
        </>
      )}
      {rootError ? <Notice message={rootError} /> : null}
      <Button label="Compare" onPress={submit} busy={form.formState.isSubmitting} style={styles.button} />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  group: { gap: space.xs },
  times: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  field: { flexGrow: 1, flexBasis: 160 },
  button: { alignSelf: 'flex-start' },
});

import { zodResolver } from '@hookform/resolvers/zod';
import type { Href } from 'expo-router';
import { useEffect, useMemo, useRef, useState } from 'react';
import { useController, useFieldArray, useForm, useWatch, type Path, type Resolver } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { ApiError } from '@/shared/api/client';
import { validateSchedule, type ScheduleIssue } from '@/shared/domain/schedule';
import { scheduleInput, type ScheduleValues, type Station, type Unit } from '@/shared/schemas';

import { enterSubmits } from '../form/enter-submits';
import { FormTextField } from '../form/form-text-field';
import { NumberField } from '../form/number-field';
import { numberFieldErrors } from '../form/number-text';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ChoiceChips } from '../ui/choice-chips';
import { Notice } from '../ui/notice';
import { Text } from '../ui/text';
import { TextField } from '../ui/text-field';
import { space } from '../ui/theme';
import { bandChoices } from './band-choices';
import { PresetPicker, type PresetOption } from './preset-picker';
import { previewDraft, type SchedulePreview } from './preview-model';
import { StepCard } from './step-card';
import { TermInfo } from '../help/term-info';
import { Heading } from '../ui/heading';

export type ScheduleEditorProps = {
  station: Station;
  unit: Unit | null;
  defaultValues: ScheduleValues;
  /** Presets to start from (new schedules only). */
  presets?: readonly PresetOption[];
  submitLabel: string;
  onSubmit: (values: ScheduleValues) => Promise<unknown>;
  onCancel?: () => void;
  bandsHref: Href;
  /** Lays out the live preview: beside the steps on wide screens, below them on phones. */
  renderPreview: (preview: SchedulePreview | null, issues: readonly ScheduleIssue[]) => React.ReactNode;
  wide: boolean;
  /** The clock the preview is computed at (tests pass a fixed one). */
  nowMs: number;
};

/** Fields the server may name in a 400 that this form shows beside an input. */
const FIELD_PATHS = ['name', 'startDate', 'endDate', 'cadence.nth', 'cadence.dutyPercent', 'stagger.stepHz', 'stagger.spanHz'];

export function ScheduleEditor({
  station,
  unit,
  defaultValues,
  presets,
  submitLabel,
  onSubmit,
  onCancel,
  bandsHref,
  renderPreview,
  wide,
  nowMs,
}: ScheduleEditorProps) {
  const form = useForm<ScheduleValues>({
    resolver: zodResolver(scheduleInput, { error: numberFieldErrors }) as unknown as Resolver<ScheduleValues>,
    defaultValues,
    mode: 'onChange',
  });
  const steps = useFieldArray({ control: form.control, name: 'steps' });
  const values = useWatch({ control: form.control }) as ScheduleValues;
  const choices = useMemo(() => bandChoices(station, unit), [station, unit]);
  const [serverErrors, setServerErrors] = useState<Record<string, string>>({});
  const [formMessage, setFormMessage] = useState<string | null>(null);

  // the same checks and expansion the server runs, on every change
  const serialized = JSON.stringify(values);
  const { issues, preview } = useMemo(() => {
    const parsed = scheduleInput.safeParse(values);
    if (!parsed.success) return { issues: [] as ScheduleIssue[], preview: null };
    const schedule = { ...parsed.data, stationId: station.id };
    return {
      issues: validateSchedule({ schedule, station, unit }),
      preview: previewDraft({ schedule: parsed.data, station, unit, nowMs }),
    };
    // eslint-disable-next-line react-hooks/exhaustive-deps -- keyed on the serialized values: the form hands out a new object every render
  }, [serialized, station, unit, nowMs]);
  const blocks = issues.filter((i) => i.level === 'block');
  const general = issues.filter((i) => i.stepIndex === undefined);

  // a server message is about the values it was given: drop it once they change
  const sent = useRef<string | null>(null);
  useEffect(() => {
    if (sent.current !== null && sent.current !== serialized) {
      setServerErrors({});
      setFormMessage(null);
      sent.current = null;
    }
  }, [serialized]);

  const submit = form.handleSubmit(async (parsed) => {
    setServerErrors({});
    setFormMessage(null);
    try {
      await onSubmit(parsed);
    } catch (error) {
      sent.current = JSON.stringify(form.getValues());
      if (!(error instanceof ApiError)) {
        setFormMessage('Something went wrong. Please try again.');
        return;
      }
      const byStep: Record<string, string> = {};
      const leftover: string[] = [];
      for (const [key, message] of Object.entries(error.fields)) {
        if (/^steps\.\d+/.test(key)) byStep[key.split('.').slice(0, 2).join('.')] ??= message;
        else if (FIELD_PATHS.includes(key)) form.setError(key as Path<ScheduleValues>, { type: 'server', message });
        else leftover.push(message);
      }
      setServerErrors(byStep);
      if (leftover.length || Object.keys(error.fields).length === 0) setFormMessage(leftover.join(' ') || error.message);
    }
  });
  enterSubmits(form.control, submit);

  const firstUsable = choices.find((c) => c.usable);
  const addStep = () => steps.append({ bandId: firstUsable?.bandId ?? '20m', slots: 1, activeHoursUtc: null });

  const stepsBlock = (
    <View style={styles.column}>
      {presets?.length ? (
        <PresetPicker
          presets={presets}
          title="Start from one of our presets"
          onPick={(option) => {
            form.reset({ ...option.schedule, endDate: null, paused: false });
            setServerErrors({});
            setFormMessage(null);
          }}
        />
      ) : null}
      <Card>
        <FormTextField control={form.control} name="name" label="Schedule name" hint="Your own name for this rotation." />
      </Card>
      <View style={styles.sectionHead}>
        <Heading level={2}>Rotation</Heading>
        <Text variant="caption" tone="muted">
          The steps run in turn, top to bottom, then round again; a step outside its hours passes its turn on.
        </Text>
      </View>
      {steps.fields.length === 0 ? (
        <Card>
          <Text tone="muted">No steps yet: add a band to start the rotation.</Text>
        </Card>
      ) : null}
      {steps.fields.map((field, index) => (
        <StepCard
          key={field.id}
          control={form.control}
          index={index}
          count={steps.fields.length}
          choices={choices}
          issues={issues.filter((i) => i.stepIndex === index)}
          serverError={serverErrors[`steps.${index}`]}
          bandsHref={bandsHref}
          onMoveUp={() => steps.move(index, index - 1)}
          onMoveDown={() => steps.move(index, index + 1)}
          onRemove={() => steps.remove(index)}
        />
      ))}
      {form.formState.errors.steps?.message || form.formState.errors.steps?.root?.message ? (
        <Text tone="danger" accessibilityRole="alert">
          {form.formState.errors.steps?.message ?? form.formState.errors.steps?.root?.message}
        </Text>
      ) : null}
      <Button
        label="Add a step"
        variant="secondary"
        onPress={addStep}
        disabled={steps.fields.length >= 24 || !firstUsable}
        style={styles.addButton}
      />
      {!firstUsable ? (
        <Text tone="danger">No band of this station is enabled with a fitting filter, so no step can transmit. Enable a band first.</Text>
      ) : null}
      <CadenceFields form={form} />
      <Card>
        <View style={styles.headingRow}>
          <Heading level={2}>Stagger</Heading>
          <TermInfo term="stagger" />
        </View>
        <Text variant="caption" tone="muted">
          Moves the audio offset from one transmission to the next, so two stations on the same offset do not meet every time.
        </Text>
        <View style={styles.fields}>
          <NumberField
            control={form.control}
            name="stagger.stepHz"
            label="Step (Hz)"
            hint="0 to 20 Hz per transmission"
            style={styles.field}
          />
          <NumberField control={form.control} name="stagger.spanHz" label="Span (Hz)" hint="0 to 100 Hz in all" style={styles.field} />
        </View>
      </Card>
      <DateFields form={form} />
    </View>
  );

  const checks = (
    <View style={styles.checks}>
      {formMessage ? <Notice message={formMessage} /> : null}
      {general.map((issue) => (
        <Text
          key={issue.message}
          variant="label"
          tone={issue.level === 'block' ? 'danger' : 'signal'}
          accessibilityRole={issue.level === 'block' ? 'alert' : undefined}
        >
          {issue.level === 'block' ? 'Blocked: ' : 'Note: '}
          {issue.message}
        </Text>
      ))}
      {blocks.length ? (
        <Text variant="caption" tone="muted">
          {blocks.length === 1 ? 'One problem stops' : `${blocks.length} problems stop`} this schedule from being saved: fix what is marked
          in red.
        </Text>
      ) : null}
      <View style={styles.actions}>
        <Button label={submitLabel} onPress={submit} disabled={blocks.length > 0} busy={form.formState.isSubmitting} />
        {onCancel ? <Button label="Cancel" variant="ghost" onPress={onCancel} /> : null}
      </View>
    </View>
  );

  return wide ? (
    <View style={styles.wide}>
      <View style={styles.wideMain}>
        {stepsBlock}
        {checks}
      </View>
      <View style={styles.wideSide}>{renderPreview(preview, issues)}</View>
    </View>
  ) : (
    <View style={styles.column}>
      {stepsBlock}
      {renderPreview(preview, issues)}
      {checks}
    </View>
  );
}

type FormApi = ReturnType<typeof useForm<ScheduleValues>>;

function CadenceFields({ form }: { form: FormApi }) {
  const cadence = useController({ control: form.control, name: 'cadence' });
  const value = cadence.field.value;
  return (
    <Card>
      <View style={styles.headingRow}>
        <Heading level={2}>How often</Heading>
        <TermInfo term="slot" />
      </View>
      <ChoiceChips<ScheduleValues['cadence']['kind']>
        label="Cadence"
        showLabel={false}
        value={value.kind}
        options={[
          { value: 'every-slot', label: 'Every slot' },
          { value: 'every-nth', label: 'Every nth slot' },
          { value: 'duty', label: 'Share of slots' },
        ]}
        onChange={(kind) => {
          if (kind === value.kind) return;
          cadence.field.onChange(
            kind === 'every-slot'
              ? { kind: 'every-slot' }
              : kind === 'every-nth'
                ? { kind: 'every-nth', nth: 5 }
                : { kind: 'duty', dutyPercent: 20 },
          );
        }}
      />
      {value.kind === 'every-nth' ? (
        <NumberField
          control={form.control}
          name={'cadence.nth' as Path<ScheduleValues>}
          label="n (every nth slot)"
          hint="2 to 30; 5 is one slot in five"
        />
      ) : value.kind === 'duty' ? (
        <NumberField
          control={form.control}
          name={'cadence.dutyPercent' as Path<ScheduleValues>}
          label="Share of slots (%)"
          hint="Slots are drawn afresh each UTC day; 20 % is common practice, above 50 % is refused."
        />
      ) : (
        <Text variant="caption" tone="muted">
          Every slot keeps the band busy: only for a short test, and only up to the 50 % limit (it is refused as it stands).
        </Text>
      )}
    </Card>
  );
}

function DateFields({ form }: { form: FormApi }) {
  const start = useController({ control: form.control, name: 'startDate' });
  const end = useController({ control: form.control, name: 'endDate' });
  return (
    <Card>
      <Heading level={2}>Dates (UTC)</Heading>
      <View style={styles.fields}>
        <TextField
          label="Start date (UTC)"
          hint="YYYY-MM-DD"
          mono
          value={start.field.value ?? ''}
          onChangeText={start.field.onChange}
          onBlur={start.field.onBlur}
          error={start.fieldState.error?.message}
          style={styles.field}
        />
        <TextField
          label="End date (UTC)"
          hint="YYYY-MM-DD, or empty to run on"
          mono
          value={end.field.value ?? ''}
          onChangeText={(text) => end.field.onChange(text.trim() === '' ? null : text)}
          onBlur={end.field.onBlur}
          error={end.fieldState.error?.message}
          style={styles.field}
        />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  headingRow: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  column: { gap: space.lg },
  wide: { flexDirection: 'row', alignItems: 'flex-start', gap: space.xl },
  wideMain: { flex: 11, minWidth: 0, gap: space.lg },
  wideSide: { flex: 10, minWidth: 0, gap: space.lg, position: 'sticky' as 'relative', top: 0 },
  sectionHead: { gap: space.xs },
  addButton: { alignSelf: 'flex-start' },
  fields: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  field: { flexGrow: 1, flexBasis: 140 },
  checks: { gap: space.sm },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});

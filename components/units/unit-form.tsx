import { zodResolver } from '@hookform/resolvers/zod';
import { useMemo } from 'react';
import { useController, useFieldArray, useForm, useWatch, type Control } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import type { z } from 'zod';

import { BAND_TABLE, bandsFor, type BandId } from '@/shared/domain';
import { cutoffProblems, FILTER_LOSS_DB, FILTER_SELECTIONS, filterSelectionLabels, stationPower } from '@/shared/domain/workshop';
import {
  ANTENNA_KINDS,
  FILTER_TYPES,
  GENERATOR_KINDS,
  TIME_SOURCES,
  generatorKindLabels,
  timeSourceLabels,
  unitInput,
  type UnitValues,
} from '@/shared/schemas';

import { serverMessage, submitWithServerErrors } from '../form/apply-server-errors';
import { FormTextField } from '../form/form-text-field';
import { SafetyCard } from '../overview/safety-card';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';
import { Text } from '../ui/text';
import { space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { ChoiceChips, MultiChoiceChips } from '../ui/choice-chips';
import { NumberField } from '../form/number-field';
import { FormSection } from '../form/form-section';
import { numberFieldErrors } from '../form/number-text';
import { PowerChain } from '../workshop/power-chain';
import { Switch } from '../ui/switch';
import { PadDesigner } from './pad-designer';
import { SupplyFigures } from './supply-figures';
import { TermInfo } from '../help/term-info';

type UnitFields = z.input<typeof unitInput>;

export const filterTypeLabels: Record<(typeof FILTER_TYPES)[number], string> = {
  butterworth: 'Butterworth',
  'chebyshev-0.1': 'Chebyshev 0.1 dB',
  'chebyshev-0.5': 'Chebyshev 0.5 dB',
  elliptic: 'Elliptic',
  other: 'Other',
};
export const antennaKindLabels: Record<(typeof ANTENNA_KINDS)[number], string> = {
  dipole: 'Dipole',
  'end-fed': 'End-fed wire',
  vertical: 'Vertical',
  loop: 'Loop',
  'dummy-load': 'Dummy load',
  other: 'Other',
};

const bandChoices = BAND_TABLE.map((band) => ({ value: band.id, label: band.name }));

export const emptyUnit: UnitFields = {
  name: '',
  serialLabel: '',
  controller: '',
  timeSource: 'network',
  generatorKind: 'pll',
  referenceHz: 25e6,
  tolerancePpm: undefined as unknown as number,
  tempCoPpmPerC: null,
  disciplined: false,
  generatorLevelDbm: undefined as unknown as number,
  attenuatorDb: 0,
  amplifier: null,
  filters: [],
  filterSelection: 'switched',
  antenna: { kind: 'dipole', bands: [], gainDbi: 2.15 },
  dutyCycle: 0.5,
  notes: '',
};

const newFilter = {
  bands: [] as BandId[],
  type: 'chebyshev-0.5' as const,
  order: 5,
  cutoffHz: undefined as unknown as number,
  controlCode: '',
};

const selectionHints: Record<(typeof FILTER_SELECTIONS)[number], string> = {
  fixed: 'The first filter below is wired in for good: only its bands can go on the air.',
  hand: 'You plug in one filter at a time: only the band of the filter you record as fitted may be scheduled.',
  switched: 'Relays switch the filters: a rotation may use every band a filter covers. Give each filter the code the controller sets.',
};
const newAmplifier = { gainDb: undefined as unknown as number, saturatedDbm: undefined as unknown as number, supplyV: 5, supplyA: 0.5 };

export type UnitFormProps = {
  defaultValues?: UnitFields;
  submitLabel?: string;
  onSubmit: (values: UnitValues) => Promise<unknown>;
  onCancel?: () => void;
};

/** The beacon hardware register's form: what the unit is made of, section by section. */
export function UnitForm({ defaultValues = emptyUnit, submitLabel = 'Save unit', onSubmit, onCancel }: UnitFormProps) {
  const form = useForm<UnitFields, unknown, UnitValues>({
    resolver: zodResolver(unitInput, { error: numberFieldErrors }),
    defaultValues,
  });
  const { control } = form;
  const filters = useFieldArray({ control, name: 'filters' });
  const disciplined = useWatch({ control, name: 'disciplined' });
  const amplifier = useWatch({ control, name: 'amplifier' });
  const filterSelection = useWatch({ control, name: 'filterSelection' }) ?? 'switched';
  const [generatorLevelDbm, filterList] = useWatch({ control, name: ['generatorLevelDbm', 'filters'] });
  const submit = submitWithServerErrors(form, onSubmit);
  const message = serverMessage(form.formState.errors);
  const invalidCount = Object.keys(form.formState.errors).filter((key) => key !== 'root').length;

  return (
    <View style={styles.form}>
      <SafetyCard />
      {message ? <Notice message={message} /> : null}

      <FormSection title="Identity" description="How you and your club tell this board apart.">
        <FormTextField control={control} name="name" label="Unit name" hint="Your own name for it, such as “Loft board”." />
        <FormTextField
          control={control}
          name="serialLabel"
          label="Serial or label"
          hint="Optional: what is written on the board or its box."
          mono
        />
      </FormSection>

      <FormSection title="Controller and time source" description="What runs the beacon and how it knows the UTC time.">
        <FormTextField control={control} name="controller" label="Controller" hint="Optional, for example “Wi-Fi microcontroller board”." />
        <ControlledChoice
          control={control}
          name="timeSource"
          label="Time source"
          options={TIME_SOURCES.map((value) => ({ value, label: timeSourceLabels[value] }))}
        />
      </FormSection>

      <FormSection title="Clock generator" description="The chip that makes the radio frequency, and the crystal it counts on.">
        <ControlledChoice
          control={control}
          name="generatorKind"
          label="Generator kind"
          options={GENERATOR_KINDS.map((value) => ({ value, label: generatorKindLabels[value] }))}
        />
        <View style={styles.pair}>
          <NumberField
            control={control}
            name="referenceHz"
            scale={1e6}
            label="Reference (MHz)"
            hint="The crystal or oscillator, e.g. 25 or 27."
            style={styles.pairItem}
          />
          <NumberField
            control={control}
            name="tolerancePpm"
            label="Tolerance (± ppm)"
            labelAccessory={<TermInfo term="ppm" />}
            hint="From its data sheet, e.g. 10."
            style={styles.pairItem}
          />
        </View>
        <ControlledToggle
          control={control}
          name="disciplined"
          label="TCXO or GPS-disciplined"
          hint="On: the reference holds its frequency as it warms up, so no temperature drift is assumed."
          onChange={(on) => on && form.setValue('tempCoPpmPerC', null)}
        />
        {disciplined ? null : (
          <NumberField
            control={control}
            name="tempCoPpmPerC"
            label="Temperature coefficient (ppm/°C)"
            hint="Its size, without a sign. Leave empty if you do not know it."
          />
        )}
      </FormSection>

      <FormSection title="Output level" description="Power out of the generator and anything that lowers it before the amplifier.">
        <View style={styles.pair}>
          <NumberField
            control={control}
            name="generatorLevelDbm"
            label="Generator output (dBm)"
            hint="e.g. 10 dBm = 10 mW."
            style={styles.pairItem}
          />
          <NumberField control={control} name="attenuatorDb" label="Attenuator (dB)" hint="0 if none is fitted." style={styles.pairItem} />
        </View>
      </FormSection>

      <FormSection title="Amplifier" description="Optional: a small stage after the generator.">
        <Switch
          label="An amplifier is fitted"
          value={amplifier != null}
          onChange={(on) => form.setValue('amplifier', on ? { ...newAmplifier } : null, { shouldDirty: true })}
        />
        {amplifier != null ? (
          <>
            <View style={styles.pair}>
              <NumberField control={control} name="amplifier.gainDb" label="Gain (dB)" style={styles.pairItem} />
              <NumberField control={control} name="amplifier.saturatedDbm" label="Saturated output (dBm)" style={styles.pairItem} />
            </View>
            <View style={styles.pair}>
              <NumberField control={control} name="amplifier.supplyV" label="Supply (V)" style={styles.pairItem} />
              <NumberField control={control} name="amplifier.supplyA" label="Supply current (A)" style={styles.pairItem} />
            </View>
            <Text variant="caption" tone="muted">
              Fuse the DC supply close to the battery or power unit, with wire rated for the current.
            </Text>
          </>
        ) : null}
      </FormSection>

      <FormSection
        title="Low-pass filters"
        description="Every band you transmit on needs its own filter; Faintline will not enable a band no filter covers."
      >
        <ControlledChoice
          control={control}
          name="filterSelection"
          label="How filters are selected"
          options={FILTER_SELECTIONS.map((value) => ({ value, label: filterSelectionLabels[value] }))}
        />
        <Text variant="caption" tone="muted">
          {selectionHints[filterSelection]}
        </Text>
        {filters.fields.length === 0 ? <Text tone="muted">No filters yet. Add one for each band you will use.</Text> : null}
        {filters.fields.map((field, index) => (
          <FilterRow
            key={field.id}
            control={control}
            index={index}
            switched={filterSelection === 'switched'}
            onRemove={() => filters.remove(index)}
          />
        ))}
        <Button label="Add a filter" variant="secondary" onPress={() => filters.append({ ...newFilter, bands: [] })} style={styles.start} />
      </FormSection>

      <FormSection title="Antenna">
        <ControlledChoice
          control={control}
          name="antenna.kind"
          label="Antenna kind"
          options={ANTENNA_KINDS.map((value) => ({ value, label: antennaKindLabels[value] }))}
        />
        <ControlledBands control={control} name="antenna.bands" label="Antenna bands" chipPrefix="Antenna" />
        <NumberField control={control} name="antenna.gainDbi" label="Antenna gain (dBi)" hint="A dipole is about 2.15 dBi." />
        <Text variant="caption" tone="muted">
          Keep people clear of the antenna while it radiates. Outdoor antennas attract lightning: ground them and disconnect before a storm.
        </Text>
      </FormSection>

      <LivePower control={control} />

      <PadDesigner
        generatorDbm={typeof generatorLevelDbm === 'number' ? generatorLevelDbm : undefined}
        amplifier={amplifier ?? null}
        filterLossDb={(filterList ?? []).length ? FILTER_LOSS_DB : 0}
        onUse={(db) => form.setValue('attenuatorDb', db, { shouldDirty: true, shouldValidate: true })}
      />

      <FormSection title="Notes">
        <FormTextField control={control} name="notes" label="Notes" multiline numberOfLines={4} />
      </FormSection>

      {invalidCount > 0 ? <Notice message="Some fields need attention: see the messages beside them." /> : null}
      <View style={styles.actions}>
        <Button label={submitLabel} onPress={submit} busy={form.formState.isSubmitting} />
        {onCancel ? <Button label="Cancel" variant="ghost" onPress={onCancel} /> : null}
      </View>
    </View>
  );
}

function FilterRow({
  control,
  index,
  switched,
  onRemove,
}: {
  control: Control<UnitFields>;
  index: number;
  switched: boolean;
  onRemove: () => void;
}) {
  const { colors } = useAppTheme();
  const number = index + 1;
  return (
    <View style={[styles.filter, { borderColor: colors.border }]}>
      <View style={styles.filterHead}>
        <Text variant="label">Filter {number}</Text>
        <Button label="Remove" variant="ghost" accessibilityLabel={`Remove filter ${number}`} onPress={onRemove} />
      </View>
      <ControlledBands control={control} name={`filters.${index}.bands`} label={`Filter ${number} bands`} chipPrefix={`Filter ${number}`} />
      <ControlledChoice
        control={control}
        name={`filters.${index}.type`}
        label={`Filter ${number} type`}
        options={FILTER_TYPES.map((value) => ({ value, label: filterTypeLabels[value] }))}
        chipLabel={(option) => `Filter ${number} type ${option.label}`}
      />
      <View style={styles.pair}>
        <NumberField
          control={control}
          name={`filters.${index}.order`}
          label={`Filter ${number} order`}
          hint="Number of poles, e.g. 5."
          style={styles.pairItem}
        />
        <NumberField
          control={control}
          name={`filters.${index}.cutoffHz`}
          scale={1e6}
          label={`Filter ${number} cut-off (MHz)`}
          hint="Above the band, below its second harmonic."
          style={styles.pairItem}
        />
      </View>
      <CutoffWarning control={control} index={index} />
      {switched ? (
        <FormTextField
          control={control}
          name={`filters.${index}.controlCode`}
          label={`Filter ${number} control code`}
          hint="What the controller sets to put this filter in circuit, e.g. relay-2 or GPIO 14."
          mono
        />
      ) : null}
    </View>
  );
}

const REGION_ONE_BANDS = bandsFor('itu1');

/** Warns, with the reason, when a filter's cut-off cannot serve a band it claims (saving stays possible: the unit may be half built). */
function CutoffWarning({ control, index }: { control: Control<UnitFields>; index: number }) {
  const [bands, cutoffHz] = useWatch({ control, name: [`filters.${index}.bands`, `filters.${index}.cutoffHz`] });
  const problems = cutoffProblems({ bands: bands ?? [], cutoffHz: Number(cutoffHz) }, REGION_ONE_BANDS);
  if (problems.length === 0) return null;
  return <Notice tone="info" message={`Check filter ${index + 1}: ${problems.join(' ')}`} />;
}

type Named = { control: Control<UnitFields>; name: string; label: string };

function ControlledChoice<T extends string>({
  control,
  name,
  label,
  options,
  chipLabel,
}: Named & { options: { value: T; label: string }[]; chipLabel?: (option: { value: T; label: string }) => string }) {
  const { field, fieldState } = useController({ control, name: name as 'timeSource' });
  return (
    <ChoiceChips
      label={label}
      options={options}
      chipLabel={chipLabel}
      value={field.value as unknown as T}
      onChange={(value) => field.onChange(value)}
      error={fieldState.error?.message}
    />
  );
}

function ControlledBands({ control, name, label, chipPrefix }: Named & { chipPrefix: string }) {
  const { field, fieldState } = useController({ control, name: name as 'antenna.bands' });
  return (
    <MultiChoiceChips
      label={label}
      options={bandChoices}
      chipLabel={(option) => `${chipPrefix}: ${option.label}`}
      value={(field.value ?? []) as BandId[]}
      onChange={(value) => field.onChange(value)}
      error={fieldState.error?.message}
    />
  );
}

function ControlledToggle({ control, name, label, hint, onChange }: Named & { hint?: string; onChange?: (value: boolean) => void }) {
  const { field } = useController({ control, name: name as 'disciplined' });
  return (
    <Switch
      label={label}
      hint={hint}
      value={!!field.value}
      onChange={(value) => {
        field.onChange(value);
        onChange?.(value);
      }}
    />
  );
}

/** The power arithmetic as the operator types, once the levels are numbers. */
function LivePower({ control }: { control: Control<UnitFields> }) {
  const [generatorLevelDbm, attenuatorDb, amplifier, filters] = useWatch({
    control,
    name: ['generatorLevelDbm', 'attenuatorDb', 'amplifier', 'filters'],
  });
  const power = useMemo(() => {
    const finite = (value: unknown) => typeof value === 'number' && Number.isFinite(value);
    if (!finite(generatorLevelDbm) || !finite(attenuatorDb ?? 0)) return null;
    if (amplifier && (!finite(amplifier.gainDb) || !finite(amplifier.saturatedDbm))) return null;
    return stationPower({
      generatorLevelDbm,
      attenuatorDb: attenuatorDb ?? 0,
      amplifier: amplifier ?? null,
      filters: (filters ?? []) as never,
    } as unknown as Parameters<typeof stationPower>[0]);
  }, [generatorLevelDbm, attenuatorDb, amplifier, filters]);
  return (
    <FormSection title="Power at the antenna" description="Worked out from the levels above. Stay within the power your licence allows.">
      {power ? (
        <>
          <PowerChain power={power} />
          <SupplyFigures power={power} amplifier={amplifier} />
        </>
      ) : (
        <Text tone="muted">Fill in the generator output to see the arithmetic.</Text>
      )}
    </FormSection>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  pair: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  pairItem: { flexGrow: 1, flexBasis: 200 },
  filter: { gap: space.md, paddingTop: space.md, borderTopWidth: 1 },
  filterHead: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between' },
  start: { alignSelf: 'flex-start' },
  actions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
});

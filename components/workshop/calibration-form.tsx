import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useController, useForm, useWatch } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { z } from 'zod';

import { bandFor, type BandId, type LicenceRegion } from '@/shared/domain';
import { calibrationInput, measurementInput, type CalibrationInput, type MeasurementInput } from '@/shared/schemas';

import { enterSubmits } from '../form/enter-submits';
import { applyServerErrors, serverMessage } from '../form/apply-server-errors';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';
import { Text } from '../ui/text';
import { TextField } from '../ui/text-field';
import { radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { ChoiceChips } from '../ui/choice-chips';
import { NumberField } from '../form/number-field';
import { parseNumberText } from '../form/number-text';
import { formatHz, formatSigned } from '../ui/format';
import type { CalibrationProposal } from './queries';
import { TermInfo } from '../help/term-info';
import { Heading } from '../ui/heading';

/** The shared measurement schema, with the words for a frequency left empty. */
const measurementFields = measurementInput.extend({
  commandedHz: z.number({ error: 'Give the frequency you commanded, in Hz' }).pipe(measurementInput.shape.commandedHz),
  observedHz: z.number({ error: 'Give the frequency your receiver heard, in Hz' }).pipe(measurementInput.shape.observedHz),
});

export type CalibrationFormProps = {
  region: LicenceRegion;
  audioOffsetHz: number;
  /** bands the operator may measure on (enabled and covered ones first) */
  bandIds: BandId[];
  onPropose: (measurement: MeasurementInput) => Promise<CalibrationProposal>;
  onAccept: (input: CalibrationInput) => Promise<unknown>;
};

const bandName = (id: BandId, region: LicenceRegion) => {
  const found = bandFor(id, region);
  return found.ok ? found.band.name : id;
};
const carrierFor = (id: BandId, region: LicenceRegion, audioOffsetHz: number) => {
  const found = bandFor(id, region);
  return found.ok ? found.band.dialHz + audioOffsetHz : undefined;
};

/**
 * The guided measurement: "I commanded X Hz on band B and my receiver heard Y Hz". Shows the reference
 * error it implies and the offsets it proposes for every enabled band, editable, then saves them.
 */
export function CalibrationForm({ region, audioOffsetHz, bandIds, onPropose, onAccept }: CalibrationFormProps) {
  const { colors } = useAppTheme();
  const firstBand = bandIds[0];
  const form = useForm<z.input<typeof measurementFields>, unknown, MeasurementInput>({
    resolver: zodResolver(measurementFields),
    defaultValues: {
      bandId: firstBand,
      commandedHz: firstBand ? carrierFor(firstBand, region, audioOffsetHz) : undefined,
      observedHz: undefined as unknown as number,
    },
  });
  const band = useController({ control: form.control, name: 'bandId' });
  const bandId = useWatch({ control: form.control, name: 'bandId' }) as BandId;
  const [proposal, setProposal] = useState<CalibrationProposal | null>(null);
  const [offsetTexts, setOffsetTexts] = useState<Record<string, string>>({});
  const [offsetErrors, setOffsetErrors] = useState<Record<string, string>>({});
  const [acceptError, setAcceptError] = useState<string | null>(null);
  const [accepting, setAccepting] = useState(false);

  const propose = form.handleSubmit(async (measurement) => {
    setAcceptError(null);
    try {
      const proposed = await onPropose(measurement);
      // lowest band first, as everywhere else
      const result = { ...proposed, offsets: [...proposed.offsets].sort((x, y) => x.frequencyHz - y.frequencyHz) };
      setProposal(result);
      setOffsetErrors({});
      setOffsetTexts(Object.fromEntries(result.offsets.map((o) => [o.bandId, o.calibrationOffsetHz.toFixed(2)])));
    } catch (error) {
      setProposal(null);
      applyServerErrors(form, error);
    }
  });
  enterSubmits(form.control, propose);

  const accept = async () => {
    if (!proposal) return;
    const offsets = proposal.offsets.map((o) => ({ bandId: o.bandId, calibrationOffsetHz: parseNumberText(offsetTexts[o.bandId] ?? '') }));
    const input = { source: 'measured' as const, referenceErrorPpm: Number(proposal.referenceErrorPpm.toFixed(4)), offsets };
    const checked = calibrationInput.safeParse(input);
    if (!checked.success) {
      const errors: Record<string, string> = {};
      for (const issue of checked.error.issues) {
        const index = issue.path[1];
        if (issue.path[0] === 'offsets' && typeof index === 'number') {
          errors[proposal.offsets[index].bandId] =
            issue.code === 'invalid_type' ? 'Give the offset in Hz, such as 29.6 or −4.2' : issue.message;
        } else setAcceptError(issue.message);
      }
      setOffsetErrors(errors);
      return;
    }
    setOffsetErrors({});
    setAccepting(true);
    try {
      await onAccept(checked.data);
    } catch (error) {
      setAcceptError(error instanceof Error ? error.message : 'The offsets could not be saved. Try again.');
    } finally {
      setAccepting(false);
    }
  };

  if (!firstBand) return <Notice tone="info" message="Enable a band first: a measurement is made on a band the beacon transmits on." />;

  const message = serverMessage(form.formState.errors);
  return (
    <View style={styles.wrap}>
      <Text tone="muted">
        Let the beacon send a steady carrier, or one transmission, on a band. Read on a receiver you trust what frequency it really heard.
        Faintline works out the reference crystal’s error from that one reading and proposes an offset for every enabled band.
      </Text>
      {message ? <Notice message={message} /> : null}
      <ChoiceChips
        label="Band measured"
        options={bandIds.map((id) => ({ value: id, label: bandName(id, region) }))}
        chipLabel={(option) => `Measured on ${option.label}`}
        value={bandId}
        onChange={(id) => {
          band.field.onChange(id);
          const carrier = carrierFor(id, region, audioOffsetHz);
          if (carrier !== undefined) form.setValue('commandedHz', carrier);
          setProposal(null);
        }}
      />
      <NumberField
        control={form.control}
        name="commandedHz"
        label="Commanded frequency (Hz)"
        hint={`What the beacon was told to send. Uncalibrated, that is the dial frequency plus the audio offset of ${audioOffsetHz} Hz.`}
      />
      <NumberField
        control={form.control}
        name="observedHz"
        label="Heard frequency (Hz)"
        hint="What your receiver showed, to a tenth of a hertz if it can."
      />
      <Button label="Work out the offsets" onPress={propose} busy={form.formState.isSubmitting} style={styles.start} />

      {proposal ? (
        <View style={[styles.proposal, { borderColor: colors.primary, backgroundColor: colors.primarySoft }]}>
          <View style={styles.headingRow}>
            <Heading level={2}>Proposed offsets</Heading>
            <TermInfo term="calibration" />
          </View>
          <Text>
            Reference error{' '}
            <Text variant="mono" tone="primary">
              {formatSigned(proposal.referenceErrorPpm, 3, 'ppm')}
            </Text>
            : on {bandName(bandId, region)} the beacon radiated {formatSigned(proposal.errorHz, 2, 'Hz')}{' '}
            {proposal.errorHz >= 0 ? 'high' : 'low'}.
          </Text>
          <Text variant="caption" tone="muted">
            An offset is the generator’s error on that band (positive = radiates high); Faintline commands each band that much lower, so the
            tones land where they should. Change any value before accepting if you measured it yourself.
          </Text>
          {proposal.offsets.map((offset) => (
            <View key={offset.bandId} style={styles.offsetRow}>
              <TextField
                label={`Offset for ${bandName(offset.bandId, region)} (Hz)`}
                value={offsetTexts[offset.bandId] ?? ''}
                onChangeText={(text) => setOffsetTexts((all) => ({ ...all, [offset.bandId]: text }))}
                error={offsetErrors[offset.bandId]}
                hint={`At ${formatHz(offset.frequencyHz, 1)}.`}
                inputMode="decimal"
                mono
                autoCorrect={false}
                style={styles.offsetField}
              />
            </View>
          ))}
          {acceptError ? <Notice message={acceptError} /> : null}
          <View style={styles.actions}>
            <Button label="Accept offsets" onPress={accept} busy={accepting} />
            <Button label="Discard" variant="ghost" onPress={() => setProposal(null)} disabled={accepting} />
          </View>
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  headingRow: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  wrap: { gap: space.lg },
  start: { alignSelf: 'flex-start' },
  proposal: { borderWidth: 1, borderRadius: radius.lg, padding: space.lg, gap: space.md },
  offsetRow: { flexDirection: 'row' },
  offsetField: { flex: 1, maxWidth: 320 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});

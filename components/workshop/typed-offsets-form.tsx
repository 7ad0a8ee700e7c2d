import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { bandFor, type BandId, type LicenceRegion } from '@/shared/domain';
import { calibrationInput, type CalibrationInput, type StationBand } from '@/shared/schemas';

import { Button } from '../ui/button';
import { Notice } from '../ui/notice';
import { Text } from '../ui/text';
import { TextField } from '../ui/text-field';
import { space } from '../ui/theme';
import { parseNumberText } from '../form/number-text';

export type TypedOffsetsFormProps = {
  region: LicenceRegion;
  /** the enabled bands, with their current offsets */
  bands: StationBand[];
  onSave: (input: CalibrationInput) => Promise<unknown>;
};

/** Per-band offsets typed in directly, for operators who measured each band themselves. */
export function TypedOffsetsForm({ region, bands, onSave }: TypedOffsetsFormProps) {
  const [texts, setTexts] = useState<Record<string, string>>(() =>
    Object.fromEntries(bands.map((b) => [b.bandId, b.calibrationOffsetHz == null ? '' : String(b.calibrationOffsetHz)])),
  );
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [formError, setFormError] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  const [saving, setSaving] = useState(false);
  if (bands.length === 0) return <Notice tone="info" message="Enable a band first; then type its offset here." />;

  const save = async () => {
    setSaved(false);
    setFormError(null);
    const filled = bands.filter((b) => (texts[b.bandId] ?? '').trim() !== '');
    const offsets = filled.map((b) => ({ bandId: b.bandId, calibrationOffsetHz: parseNumberText(texts[b.bandId]) }));
    const checked = calibrationInput.safeParse({ source: 'typed', offsets });
    if (!checked.success) {
      const next: Record<string, string> = {};
      for (const issue of checked.error.issues) {
        const index = issue.path[1];
        if (issue.path[0] === 'offsets' && typeof index === 'number')
          next[filled[index].bandId] = issue.code === 'invalid_type' ? 'Give the offset in Hz, such as 29.6 or −4.2' : issue.message;
        else setFormError(filled.length === 0 ? 'Type the offset of at least one band.' : issue.message);
      }
      setErrors(next);
      return;
    }
    setErrors({});
    setSaving(true);
    try {
      await onSave(checked.data);
      setSaved(true);
    } catch (error) {
      setFormError(error instanceof Error ? error.message : 'The offsets could not be saved. Try again.');
    } finally {
      setSaving(false);
    }
  };

  return (
    <View style={styles.wrap}>
      <Text tone="muted">
        The offset is how far the generator radiates from the frequency it was told, on that band, in Hz (positive = high). Leave a band
        empty to keep its current value.
      </Text>
      {bands.map((b) => {
        const found = bandFor(b.bandId as BandId, region);
        const name = found.ok ? found.band.name : b.bandId;
        return (
          <TextField
            key={b.bandId}
            label={`Typed offset for ${name} (Hz)`}
            value={texts[b.bandId] ?? ''}
            onChangeText={(text) => setTexts((all) => ({ ...all, [b.bandId]: text }))}
            error={errors[b.bandId]}
            inputMode="decimal"
            mono
            autoCorrect={false}
            style={styles.field}
          />
        );
      })}
      {formError ? <Notice message={formError} /> : null}
      {saved ? <Notice tone="success" message="Offsets saved." /> : null}
      <Button label="Save typed offsets" onPress={save} busy={saving} style={styles.start} />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  field: { maxWidth: 320 },
  start: { alignSelf: 'flex-start' },
});

import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import type { ImportColumnRole, ImportFrequencyUnit, ImportMapping, ImportPreview, ImportTimeFormat } from '@/shared/api/receptions';

import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { ChoiceChips } from '../ui/choice-chips';

export const ROLE_LABELS: Record<ImportColumnRole, string> = {
  ignore: 'Not used',
  time: 'Slot time (UTC)',
  band: 'Band',
  frequency: 'Frequency heard',
  txCallsign: 'Transmitter callsign',
  txLocator: 'Transmitter locator',
  txPowerDbm: 'Transmitter power (dBm)',
  rxCallsign: 'Receiver callsign',
  rxLocator: 'Receiver locator',
  snrDb: 'SNR (dB)',
  driftHz: 'Drift (Hz)',
};

const ROLE_OPTIONS = (Object.keys(ROLE_LABELS) as ImportColumnRole[]).map((value) => ({ value, label: ROLE_LABELS[value] }));

const TIME_OPTIONS: { value: ImportTimeFormat; label: string }[] = [
  { value: 'iso', label: 'ISO 8601 (2026-12-02T10:04:00Z)' },
  { value: 'date-time', label: '2026-12-02 10:04' },
  { value: 'epoch-seconds', label: 'Seconds since 1970' },
];

const UNIT_OPTIONS: { value: ImportFrequencyUnit; label: string }[] = [
  { value: 'hz', label: 'Hz' },
  { value: 'khz', label: 'kHz' },
  { value: 'mhz', label: 'MHz' },
];

const DELIMITER_WORDS: Record<ImportMapping['delimiter'], string> = { ',': 'commas', '\t': 'tabs', ';': 'semicolons' };

export function columnName(column: ImportMapping['columns'][number]): string {
  return column.header ? `“${column.header}”` : `column ${column.index + 1}`;
}

export type MappingEditorProps = {
  mapping: ImportMapping;
  /** sample cells per column, from the preview */
  samples: ImportPreview['rows'];
  onChange: (mapping: ImportMapping) => void;
};

/** How each column of the file is read; every choice can be corrected before anything is stored. */
export function MappingEditor({ mapping, samples, onChange }: MappingEditorProps) {
  const { colors } = useAppTheme();
  const [open, setOpen] = useState<number | null>(null);
  const setRole = (index: number, role: ImportColumnRole) => {
    onChange({ ...mapping, columns: mapping.columns.map((c) => (c.index === index ? { ...c, role } : c)) });
    setOpen(null);
  };
  const usesTime = mapping.columns.some((c) => c.role === 'time');
  const usesFrequency = mapping.columns.some((c) => c.role === 'frequency');
  return (
    <View style={styles.root}>
      <Text tone="muted">
        Fields separated by {DELIMITER_WORDS[mapping.delimiter]};{' '}
        {mapping.hasHeader ? 'the first line names the columns' : 'no header line'}.
      </Text>
      <View style={styles.columns}>
        {mapping.columns.map((column) => {
          const sample = samples
            .slice(0, 3)
            .map((row) => row.cells[column.index] ?? '')
            .filter(Boolean)
            .join(' · ');
          return (
            <Card key={column.index} style={[styles.column, column.role === 'ignore' && { backgroundColor: colors.background }]}>
              <View style={styles.columnHead}>
                <View style={styles.grow}>
                  <Text variant="label">{columnName(column)}</Text>
                  <Text variant="caption" tone="muted" numberOfLines={1}>
                    {sample || 'empty in the first rows'}
                  </Text>
                </View>
                <Text variant="label" tone={column.role === 'ignore' ? 'muted' : 'primary'}>
                  {ROLE_LABELS[column.role]}
                </Text>
                <Button
                  label={open === column.index ? 'Close' : 'Change'}
                  accessibilityLabel={`${open === column.index ? 'Close' : 'Change'} what ${columnName(column)} holds`}
                  variant="ghost"
                  onPress={() => setOpen(open === column.index ? null : column.index)}
                />
              </View>
              {open === column.index ? (
                <View style={[styles.picker, { borderColor: colors.border }]}>
                  <ChoiceChips
                    label={`What ${columnName(column)} holds`}
                    options={ROLE_OPTIONS}
                    value={column.role}
                    onChange={(role) => setRole(column.index, role)}
                  />
                </View>
              ) : null}
            </Card>
          );
        })}
      </View>
      {usesTime ? (
        <ChoiceChips
          label="Times are written as"
          options={TIME_OPTIONS}
          value={mapping.timeFormat}
          onChange={(timeFormat) => onChange({ ...mapping, timeFormat })}
          hint="Always read as UTC."
        />
      ) : null}
      {usesFrequency ? (
        <ChoiceChips
          label="Frequencies are in"
          options={UNIT_OPTIONS}
          value={mapping.frequencyUnit}
          onChange={(frequencyUnit) => onChange({ ...mapping, frequencyUnit })}
        />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: space.md },
  columns: { gap: space.sm },
  column: { padding: space.md, gap: space.sm },
  columnHead: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  grow: { flexGrow: 1, flexShrink: 1, flexBasis: 140, minWidth: 0 },
  picker: { borderTopWidth: 1, paddingTop: space.sm, borderRadius: radius.sm },
});

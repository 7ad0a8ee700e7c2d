import { StyleSheet, View } from 'react-native';

import type { presetsFor } from '@/shared/domain/schedule';

import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { space } from '../ui/theme';
import { bandName, cadenceLabel, hoursLabel } from './schedule-words';
import { Heading } from '../ui/heading';

export type PresetOption = ReturnType<typeof presetsFor>[number];

export type PresetPickerProps = {
  presets: readonly PresetOption[];
  title: string;
  onPick: (option: PresetOption) => void;
};

/** Faintline's own starting points, already built for the station's enabled bands. */
export function PresetPicker({ presets, title, onPick }: PresetPickerProps) {
  return (
    <Card tone="primary">
      <Heading level={2}>{title}</Heading>
      <View style={styles.list}>
        {presets.map((option) => (
          <View key={option.preset.id} style={styles.item}>
            <View style={styles.text}>
              <Text variant="label">{option.preset.title}</Text>
              <Text variant="caption" tone="muted">
                {option.preset.summary}
              </Text>
              <Text variant="caption">
                {option.schedule.steps.map((s) => `${bandName(s.bandId)} (${hoursLabel(s.activeHoursUtc)})`).join(' → ')} ·{' '}
                {cadenceLabel(option.schedule.cadence)}
              </Text>
            </View>
            <Button
              label="Use"
              variant="secondary"
              accessibilityLabel={`Use preset ${option.preset.title}`}
              onPress={() => onPick(option)}
              style={styles.button}
            />
          </View>
        ))}
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.md },
  item: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  text: { flex: 1, gap: 2 },
  button: { minHeight: 38 },
});

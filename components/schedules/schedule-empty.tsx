import { StyleSheet, View } from 'react-native';

import { presetsFor } from '@/shared/domain/schedule';
import type { Station } from '@/shared/schemas';

import { Button } from '../ui/button';
import { EmptyState } from '../ui/query-states';
import { Text } from '../ui/text';
import { TextLink } from '../ui/text-link';
import { space } from '../ui/theme';
import { utcDate } from '../ui/format';
import { PresetPicker } from './preset-picker';

export type ScheduleEmptyProps = {
  station: Station;
  readOnly: boolean;
  nowMs: number;
  /** Opens the editor, from scratch or from a preset. */
  onBuild: (presetId?: string) => void;
};

/** No schedule yet: our presets as starting points, or a rotation from scratch. */
export function ScheduleEmpty({ station, readOnly, nowMs, onBuild }: ScheduleEmptyProps) {
  const enabledBands = station.bands.filter((b) => b.enabled).map((b) => b.bandId);
  if (readOnly) {
    return <EmptyState title="No schedule yet" message={`${station.ownerName} has not planned a band rotation for ${station.name}.`} />;
  }
  const presets = presetsFor({ enabledBands, locator: station.locator, startDate: utcDate(nowMs) });
  return (
    <View style={styles.wrap}>
      <Text variant="mono" tone="primary">
        {station.name} · {station.callsign}
      </Text>
      <EmptyState
        title="No schedule yet"
        message="A schedule is a rotation of bands: each step holds a band for a few slots, optionally only at certain UTC hours, and the rotation repeats."
        action={
          enabledBands.length ? (
            <Button label="Build a rotation" onPress={() => onBuild()} />
          ) : (
            <View style={styles.none}>
              <Text tone="danger">
                No band is enabled on this station yet, so a rotation has nothing to use. Enable and calibrate bands first.
              </Text>
              <TextLink href={{ pathname: '/stations/[id]/bands', params: { id: String(station.id) } }} label="Open the station's bands" />
            </View>
          )
        }
      />
      {presets.length ? (
        <PresetPicker presets={presets} title="Or start from one of our presets" onPick={(o) => onBuild(o.preset.id)} />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  none: { gap: space.sm },
});

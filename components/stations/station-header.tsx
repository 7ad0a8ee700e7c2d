import { StyleSheet, View } from 'react-native';

import type { Station } from '@/shared/schemas';

import { Button } from '../ui/button';
import { formatLocator } from '../ui/format';
import { Text } from '../ui/text';
import { space } from '../ui/theme';
import { ScreenTitle } from '../ui/screen-title';

export type StationHeaderProps = {
  station: Station;
  /** Owner actions; left out when the station is shown read-only. */
  onEdit?: () => void;
  onDelete?: () => void;
};

export function StationHeader({ station, onEdit, onDelete }: StationHeaderProps) {
  return (
    <View style={styles.head}>
      <View style={styles.titleBlock}>
        <ScreenTitle>{station.name}</ScreenTitle>
        <Text variant="mono" tone="primary">
          {station.callsign} · {formatLocator(station.locator)}
        </Text>
      </View>
      {onEdit || onDelete ? (
        <View style={styles.actions}>
          {onEdit ? <Button label="Edit" variant="secondary" accessibilityLabel={`Edit ${station.name}`} onPress={onEdit} /> : null}
          {onDelete ? <Button label="Delete" variant="danger" accessibilityLabel={`Delete ${station.name}`} onPress={onDelete} /> : null}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', justifyContent: 'space-between', gap: space.md },
  titleBlock: { gap: space.xs, flexShrink: 1 },
  actions: { flexDirection: 'row', gap: space.sm },
});

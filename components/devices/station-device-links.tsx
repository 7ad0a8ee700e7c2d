import { StyleSheet, View } from 'react-native';

import { TextLink } from '../ui/text-link';
import { space } from '../ui/theme';

export type StationDeviceLinksProps = { stationId: number; readOnly: boolean };

/** From the station detail: its live health, and (for the owner) its device token. */
export function StationDeviceLinks({ stationId, readOnly }: StationDeviceLinksProps) {
  const id = String(stationId);
  return (
    <View style={styles.row}>
      <TextLink href={{ pathname: '/health/[id]', params: { id } }} label="Device health" />
      {readOnly ? null : <TextLink href={{ pathname: '/stations/[id]/device', params: { id } }} label="Device token" />}
    </View>
  );
}

const styles = StyleSheet.create({ row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg } });

import { StyleSheet, View } from 'react-native';

import type { Station } from '@/shared/schemas';

import { Button } from '../ui/button';
import { formatLocator } from '../ui/format';
import { Text } from '../ui/text';
import { space } from '../ui/theme';
import { ScreenTitle } from '../ui/screen-title';

export type WorkshopHeaderProps = {
  title: string;
  station: Station;
  intro?: string;
  actions?: { label: string; onPress: () => void; secondary?: boolean }[];
};

/** The head of a station's workshop screen: what it is, for which station, and where to go next. */
export function WorkshopHeader({ title, station, intro, actions = [] }: WorkshopHeaderProps) {
  return (
    <View style={styles.wrap}>
      <View style={styles.head}>
        <View style={styles.titleBlock}>
          <ScreenTitle context={station.name}>{title}</ScreenTitle>
          <Text variant="mono" tone="primary">
            {station.name} · {station.callsign} · {formatLocator(station.locator)}
          </Text>
        </View>
        {actions.length ? (
          <View style={styles.actions}>
            {actions.map((action) => (
              <Button
                key={action.label}
                label={action.label}
                variant={action.secondary ? 'secondary' : 'primary'}
                onPress={action.onPress}
              />
            ))}
          </View>
        ) : null}
      </View>
      {intro ? <Text tone="muted">{intro}</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', justifyContent: 'space-between', gap: space.md },
  titleBlock: { gap: space.xs, flexShrink: 1 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});

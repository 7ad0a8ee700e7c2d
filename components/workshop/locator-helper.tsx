import { useState } from 'react';
import { Platform, StyleSheet, View } from 'react-native';

import { latLonToLocator } from '@/shared/domain/locator';

import { Button } from '../ui/button';
import { Text } from '../ui/text';
import { TextField } from '../ui/text-field';
import { radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { parseNumberText } from '../form/number-text';

export type LocatorHelperProps = { onLocator: (locator: string) => void };

/** Works out a 6-character locator from latitude and longitude, typed in or from the browser's location. */
export function LocatorHelper({ onLocator }: LocatorHelperProps) {
  const { colors } = useAppTheme();
  const [lat, setLat] = useState('');
  const [lon, setLon] = useState('');
  const [message, setMessage] = useState<{ tone: 'danger' | 'muted'; text: string } | null>(null);
  const [locating, setLocating] = useState(false);

  const fill = (latitude: number | undefined, longitude: number | undefined, how: string) => {
    if (latitude === undefined || longitude === undefined || Number.isNaN(latitude) || Number.isNaN(longitude))
      return setMessage({ tone: 'danger', text: 'Give both latitude and longitude in decimal degrees, such as 51.5 and −0.12.' });
    const result = latLonToLocator({ lat: latitude, lon: longitude }, 6);
    if (!result.ok) return setMessage({ tone: 'danger', text: result.reason });
    onLocator(result.locator);
    setMessage({ tone: 'muted', text: `Locator set to ${result.locator} ${how}.` });
  };

  const locate = () => {
    const geo = Platform.OS === 'web' && typeof navigator !== 'undefined' ? navigator.geolocation : undefined;
    if (!geo)
      return setMessage({ tone: 'danger', text: 'This browser cannot tell its location: type the latitude and longitude instead.' });
    setLocating(true);
    setMessage(null);
    geo.getCurrentPosition(
      (position) => {
        setLocating(false);
        setLat(position.coords.latitude.toFixed(5));
        setLon(position.coords.longitude.toFixed(5));
        fill(position.coords.latitude, position.coords.longitude, 'from this device’s location');
      },
      (error) => {
        setLocating(false);
        setMessage({
          tone: 'danger',
          text:
            error.code === error.PERMISSION_DENIED
              ? 'Location was not shared. Allow it in the browser, or type the latitude and longitude.'
              : 'The location could not be found. Type the latitude and longitude instead.',
        });
      },
      { enableHighAccuracy: false, timeout: 15000, maximumAge: 600000 },
    );
  };

  return (
    <View style={[styles.box, { borderColor: colors.border, backgroundColor: colors.background }]}>
      <Text variant="label">Locator helper</Text>
      <Text variant="caption" tone="muted">
        Where the antenna stands, in decimal degrees (north and east positive). Nothing here is stored, only the locator.
      </Text>
      <View style={styles.pair}>
        <TextField label="Latitude (°)" value={lat} onChangeText={setLat} inputMode="decimal" mono style={styles.item} />
        <TextField label="Longitude (°)" value={lon} onChangeText={setLon} inputMode="decimal" mono style={styles.item} />
      </View>
      <View style={styles.actions}>
        <Button
          label="Fill the locator"
          variant="secondary"
          onPress={() => fill(parseNumberText(lat), parseNumberText(lon), 'from the coordinates')}
        />
        <Button label="Use my location" variant="ghost" busy={locating} onPress={locate} />
      </View>
      {message ? (
        <Text variant="caption" tone={message.tone} accessibilityRole={message.tone === 'danger' ? 'alert' : undefined}>
          {message.text}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderWidth: 1, borderRadius: radius.md, padding: space.md, gap: space.sm },
  pair: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  item: { flexGrow: 1, flexBasis: 140 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});

import { lazy, Suspense } from 'react';
import { StyleSheet, View } from 'react-native';

import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { Button } from '../ui/button';
import { space } from '../ui/theme';

// the QR encoder stays out of the start-up bundle: it loads with this card
const QrCode = lazy(() => import('./qr-code'));

export type PairingCardProps = { origin: string; onPair: () => void };

const EXAMPLE_CODE = 'BCDF-GHJK';

/** On the device screen: pairing by code, the way that needs no token copied; the token below stays the fallback. */
export function PairingCard({ origin, onPair }: PairingCardProps) {
  const example = `${origin}/pair?code=${EXAMPLE_CODE}`;
  return (
    <Card>
      <Text variant="heading" accessibilityRole="header">
        Pair a device by code
      </Text>
      <Text>
        A device that supports pairing shows (or prints on its serial console) a code of 8 letters. Type it on the pairing page and choose
        this station: the device receives its token by itself. It replaces any token the station has now.
      </Text>
      <Button label="Pair a device" onPress={onPair} style={styles.button} />
      <View style={styles.qrRow}>
        <Suspense fallback={<View style={styles.qrSpace} />}>
          <QrCode value={example} sizePx={132} label={`QR code of ${example}`} />
        </Suspense>
        <View style={styles.qrText}>
          <Text variant="label">A device with a display</Text>
          <Text variant="caption" tone="muted">
            shows the code and a QR code of its pairing link (verification_uri_complete), like this one for the example code {EXAMPLE_CODE}.
            A phone camera opens the pairing page with the code filled in.
          </Text>
        </View>
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  button: { alignSelf: 'flex-start', marginTop: space.xs },
  qrRow: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.lg, marginTop: space.sm },
  qrSpace: { width: 132, height: 132 },
  qrText: { flex: 1, minWidth: 180, gap: space.xs },
});

import { lazy, Suspense, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { Button } from '../ui/button';
import { space } from '../ui/theme';
import { Heading } from '../ui/heading';

// the QR encoder stays out of the start-up bundle: it loads when the example is asked for
const QrCode = lazy(() => import('./qr-code'));

export type PairingCardProps = { origin: string; onPair: () => void };

const EXAMPLE_CODE = 'BCDF-GHJK';

/** On the device screen: pairing by code, the way that needs no token copied; the token below stays the fallback. */
export function PairingCard({ origin, onPair }: PairingCardProps) {
  const example = `${origin}/pair?code=${EXAMPLE_CODE}`;
  const [showQr, setShowQr] = useState(false);
  return (
    <Card>
      <Heading level={2}>Pair a device by code</Heading>
      <Text>
        A device that supports pairing shows (or prints on its serial console) a code of 8 letters. Type it on the pairing page and choose
        this station: the device receives its token by itself. It replaces any token the station has now.
      </Text>
      <Button label="Pair a device" onPress={onPair} style={styles.button} />
      <View style={styles.qrRow}>
        {showQr ? (
          <Suspense fallback={<View style={styles.qrSpace} />}>
            <QrCode value={example} sizePx={132} label={`QR code of ${example}`} />
          </Suspense>
        ) : null}
        <View style={styles.qrText}>
          <Text variant="label">A device with a display</Text>
          <Text variant="caption" tone="muted">
            shows the code and a QR code of its pairing link (verification_uri_complete): a phone camera opens the pairing page with the
            code filled in.
          </Text>
          {showQr ? (
            <Text variant="caption" tone="muted">
              This one is for the example code {EXAMPLE_CODE}.
            </Text>
          ) : (
            <Button label="Show an example QR code" variant="ghost" onPress={() => setShowQr(true)} style={styles.button} />
          )}
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

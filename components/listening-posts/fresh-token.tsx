import { useState } from 'react';
import { Platform, StyleSheet, View } from 'react-native';

import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { Notice } from '../ui/notice';
import { Text } from '../ui/text';
import { radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { receptionsCurlExample, receptionsEndpoint } from './howto';
import { Heading } from '../ui/heading';

async function copyText(text: string): Promise<boolean> {
  if (Platform.OS !== 'web' || typeof navigator === 'undefined' || !navigator.clipboard) return false;
  try {
    await navigator.clipboard.writeText(text);
    return true;
  } catch {
    return false;
  }
}

export type FreshListeningTokenProps = { postName: string; token: string; origin: string; onDone: () => void };

/** A listening post's token, shown this once, with how the receiver uses it. */
export function FreshListeningToken({ postName, token, origin, onDone }: FreshListeningTokenProps) {
  const { colors } = useAppTheme();
  const [copied, setCopied] = useState<'yes' | 'no' | null>(null);
  return (
    <Card tone="signal">
      <Heading level={2}>Token for “{postName}”</Heading>
      <Text>Put it into the receiver now. You will not see it again: Faintline keeps only a fingerprint of it.</Text>
      <View style={[styles.box, { backgroundColor: colors.surfaceRaised, borderColor: colors.signal }]}>
        <Text variant="mono" selectable accessibilityLabel="Listening post token" style={styles.breakable}>
          {token}
        </Text>
      </View>
      <View style={styles.actions}>
        <Button
          label={copied === 'yes' ? 'Copied' : 'Copy token'}
          onPress={async () => setCopied((await copyText(token)) ? 'yes' : 'no')}
        />
        <Button label="I have stored it" variant="ghost" onPress={onDone} />
      </View>
      {copied === 'no' ? <Notice tone="info" message="This browser did not allow copying: select the token and copy it by hand." /> : null}
      <Text variant="label">How the receiver reports what it decoded</Text>
      <Text tone="muted">
        Up to 500 decodes per request, to {receptionsEndpoint(origin)}. With the token in the shell variable FAINTLINE_TOKEN:
      </Text>
      <View style={[styles.box, { backgroundColor: colors.surface, borderColor: colors.border }]}>
        <Text variant="mono" selectable style={[styles.code, styles.breakable]}>
          {receptionsCurlExample(origin)}
        </Text>
      </View>
      <Text variant="caption" tone="muted">
        A 202 answer means the reports are stored; it counts accepted and duplicate reports and lists any rejected one with the reason.
      </Text>
    </Card>
  );
}

const breakAnywhere = (Platform.OS === 'web' ? { wordBreak: 'break-all' } : {}) as object;

const styles = StyleSheet.create({
  box: { borderWidth: 1, borderRadius: radius.md, padding: space.md },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  code: { fontSize: 13, lineHeight: 19 },
  breakable: { ...breakAnywhere },
});

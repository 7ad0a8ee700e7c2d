import { StyleSheet, View } from 'react-native';

import type { PairingDecision } from '@/shared/schemas';

import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { TextLink } from '../ui/text-link';
import { space } from '../ui/theme';
import { Heading } from '../ui/heading';

export type PairingOutcomeProps = { decision: PairingDecision; onAnother: () => void };

/** Step three: what happens now on the device's side. */
export function PairingOutcome({ decision, onAnother }: PairingOutcomeProps) {
  if (decision.status === 'refused') {
    return (
      <Card>
        <Heading level={2}>Device refused</Heading>
        <Text>The device is told so at its next poll and receives nothing. Its code cannot be used again.</Text>
        <Button label="Pair another device" variant="secondary" onPress={onAnother} style={styles.button} />
      </Card>
    );
  }
  const id = String(decision.target.id);
  return (
    <Card tone="primary">
      <Heading level={2}>Paired with {decision.target.name}</Heading>
      <Text>
        The device receives its token at its next poll (within seconds) and fetches its configuration with it. Keep it powered until it
        shows it is connected.
      </Text>
      <View style={styles.links}>
        <TextLink href={{ pathname: '/health/[id]', params: { id } }} label="Watch its health" />
        <TextLink href={{ pathname: '/stations/[id]/device', params: { id } }} label="Device token" />
      </View>
      <Button label="Pair another device" variant="secondary" onPress={onAnother} style={styles.button} />
    </Card>
  );
}

const styles = StyleSheet.create({
  links: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg, marginVertical: space.xs },
  button: { alignSelf: 'flex-start' },
});

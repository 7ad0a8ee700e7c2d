import { StyleSheet, View } from 'react-native';

import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { Notice } from '../ui/notice';
import { Text } from '../ui/text';
import { space } from '../ui/theme';
import { Heading } from '../ui/heading';

export type SessionsCardProps = {
  onSignOut: () => void;
  signingOut: boolean;
  signOutError?: string;
  /** Opens the "sign out everywhere else" dialog. */
  onEndOthers: () => void;
  /** What the last "sign out everywhere else" did. */
  endedMessage?: string;
};

export function SessionsCard({ onSignOut, signingOut, signOutError, onEndOthers, endedMessage }: SessionsCardProps) {
  return (
    <Card>
      <Heading level={2}>Sessions</Heading>
      <Text tone="muted">Signed in on a shared or lost computer or phone? Sign out everywhere else; this browser stays signed in.</Text>
      {signOutError ? <Notice message={signOutError} /> : null}
      {endedMessage ? <Notice tone="success" message={endedMessage} /> : null}
      <View style={styles.row}>
        <Button label="Sign out everywhere else" variant="secondary" onPress={onEndOthers} />
        <Button label="Sign out" variant="secondary" busy={signingOut} onPress={onSignOut} />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({ row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md } });

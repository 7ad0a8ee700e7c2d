import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { ApiError } from '@/shared/api/client';
import type { SessionUser } from '@/shared/api/contracts';

import { Button } from '../ui/button';
import { Notice } from '../ui/notice';
import { Text } from '../ui/text';
import { space } from '../ui/theme';

export type JoinPanelProps = {
  token: string;
  user: SessionUser;
  /** Set once the invitation is accepted. */
  joined: { clubId: number; clubName?: string } | null;
  onAccept: (token: string) => Promise<unknown>;
  onOpenClub: (clubId: number) => void;
  onSkip: () => void;
  onSignOut: () => void;
};

/** Accepting an invitation as the signed-in operator, with the reasons it may not work said plainly. */
export function JoinPanel({ token, user, joined, onAccept, onOpenClub, onSkip, onSignOut }: JoinPanelProps) {
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<{ message: string; wrongAccount: boolean } | null>(null);
  if (joined) {
    return (
      <View style={styles.wrap}>
        <Notice tone="success" message={`You are now a member of ${joined.clubName ?? 'the club'}.`} />
        <Button label="Open the club" onPress={() => onOpenClub(joined.clubId)} style={styles.button} />
      </View>
    );
  }
  if (!token) {
    return (
      <View style={styles.wrap}>
        <Notice message="This link has no invitation in it. Open the link from the e-mail again, or ask the club admin for a new invitation." />
        <Button label="Go to the overview" variant="secondary" onPress={onSkip} style={styles.button} />
      </View>
    );
  }
  const submit = async () => {
    setBusy(true);
    setProblem(null);
    try {
      await onAccept(token);
    } catch (error) {
      if (error instanceof ApiError) {
        const message = error.fields.token ?? error.message;
        setProblem({ message: explain(message), wrongAccount: error.status === 403 });
      } else setProblem({ message: 'Something went wrong. Please try again.', wrongAccount: false });
    } finally {
      setBusy(false);
    }
  };
  return (
    <View style={styles.wrap}>
      <Text>
        You are signed in as <Text variant="label">{user.displayName}</Text> ({user.email}). Accept to join the club that invited you: its
        admins will see your stations and may propose offsets or stop a station that breaks the rules.
      </Text>
      {problem ? <Notice message={problem.message} /> : null}
      <View style={styles.actions}>
        <Button label="Accept invitation" onPress={submit} busy={busy} />
        <Button label="Not now" variant="ghost" onPress={onSkip} disabled={busy} />
      </View>
      {problem?.wrongAccount ? (
        <Button label="Sign out and use another account" variant="secondary" onPress={onSignOut} style={styles.button} />
      ) : null}
    </View>
  );
}

/** The server's words for the token, turned into what to do next. */
function explain(message: string): string {
  if (/already used/i.test(message))
    return 'This invitation has already been used. Ask the club admin for a new one if you still need to join.';
  if (/expired/i.test(message)) return 'This invitation has expired (links work for 7 days). Ask the club admin to send a new one.';
  if (/not valid/i.test(message)) return 'This invitation link is not valid. Check that you opened the whole link from the e-mail.';
  return message;
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  button: { alignSelf: 'flex-start' },
});

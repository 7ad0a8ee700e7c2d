import { StyleSheet, View } from 'react-native';

import { useState } from 'react';

import { DeleteAccountCard, SignInCards } from '@/components/account/account-cards';
import { deletionSummary } from '@/components/account/deletion-words';
import { endedSessionsWords } from '@/components/account/password-form';
import { useDeleteAccountMutation, useDeletionPreviewQuery, useEndOtherSessionsMutation } from '@/components/account/queries';
import { SessionsCard } from '@/components/account/sessions-card';
import { ProfileForm } from '@/components/auth/profile-form';
import { useSessionQuery, useSignOutMutation, useUpdateProfileMutation } from '@/components/auth/queries';
import { useConfirmedMutation } from '@/components/query/use-confirmed-mutation';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { Card } from '@/components/ui/card';
import { Screen } from '@/components/ui/screen';
import { SegmentedChoice } from '@/components/ui/segmented-choice';
import { Text } from '@/components/ui/text';
import type { ThemePreference } from '@/components/ui/theme';
import { space } from '@/components/ui/theme';
import { useAppTheme } from '@/components/ui/theme-provider';
import { ScreenTitle } from '@/components/ui/screen-title';

const themeOptions: { value: ThemePreference; label: string }[] = [
  { value: 'system', label: 'System' },
  { value: 'light', label: 'Light' },
  { value: 'dark', label: 'Dark' },
];

export default function SettingsRoute() {
  const user = useSessionQuery().data;
  const signOut = useSignOutMutation();
  const updateProfile = useUpdateProfileMutation();
  const { preference, setPreference } = useAppTheme();
  const endOthers = useConfirmedMutation(useEndOtherSessionsMutation());
  const [ended, setEnded] = useState<string>();
  const deletion = useConfirmedMutation(useDeleteAccountMutation(), null as { password: string } | null);
  const preview = useDeletionPreviewQuery().data;
  return (
    <Screen
      overlay={
        <>
          <ConfirmDialog
            {...endOthers.dialog}
            title="Sign out everywhere else?"
            message="Every other browser or phone signed in to your account is signed out and must sign in again. This one stays signed in."
            confirmLabel="Sign out the others"
            onConfirm={() => endOthers.confirm(undefined, ({ ended: n }) => setEnded(endedSessionsWords(n)))}
          />
          <ConfirmDialog
            {...deletion.dialog}
            destructive
            title="Delete your account for good?"
            message={deletionSummary(preview)}
            confirmLabel="Delete my account"
            onConfirm={() => deletion.asking && deletion.confirm(deletion.asking)}
          />
        </>
      }
    >
      <ScreenTitle>Settings</ScreenTitle>
      <Card>
        <Text variant="heading">Account</Text>
        <Row label="Clubs" value={user?.clubs.length ? user.clubs.map((club) => club.clubName).join(', ') : 'None'} />
        {user ? (
          <ProfileForm
            key={user.id}
            initialValues={{ displayName: user.displayName, callsign: user.callsign }}
            onSubmit={(values) => updateProfile.mutateAsync(values)}
          />
        ) : null}
      </Card>
      {user ? <SignInCards user={user} /> : null}
      <Card>
        <Text variant="heading">Appearance</Text>
        <Text tone="muted">“System” follows your device’s light or dark setting.</Text>
        <SegmentedChoice label="Theme" options={themeOptions} value={preference} onChange={setPreference} />
      </Card>
      <SessionsCard
        onSignOut={() => signOut.mutate()}
        signingOut={signOut.isPending}
        signOutError={signOut.error?.message}
        onEndOthers={() => {
          setEnded(undefined);
          endOthers.ask();
        }}
        endedMessage={ended}
      />
      <DeleteAccountCard onAsk={(values) => deletion.ask(values)} />
    </Screen>
  );
}

function Row({ label, value }: { label: string; value: string }) {
  return (
    <View style={styles.row}>
      <Text variant="label" tone="muted" style={styles.rowLabel}>
        {label}
      </Text>
      <Text style={styles.rowValue}>{value}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, paddingVertical: 2 },
  rowLabel: { width: 80 },
  rowValue: { flexShrink: 1 },
});

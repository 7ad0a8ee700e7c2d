import { StyleSheet, View } from 'react-native';

import { ProfileForm } from '@/components/auth/profile-form';
import { useSessionQuery, useSignOutMutation, useUpdateProfileMutation } from '@/components/auth/queries';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { SegmentedChoice } from '@/components/ui/segmented-choice';
import { Text } from '@/components/ui/text';
import type { ThemePreference } from '@/components/ui/theme';
import { space } from '@/components/ui/theme';
import { useAppTheme } from '@/components/ui/theme-provider';

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
  return (
    <Screen>
      <Text variant="title" accessibilityRole="header">
        Settings
      </Text>
      <Card>
        <Text variant="heading">Account</Text>
        <Row label="E-mail" value={user?.email ?? '—'} />
        <Row label="Clubs" value={user?.clubs.length ? user.clubs.map((club) => club.clubName).join(', ') : 'None'} />
        {user ? (
          <ProfileForm
            key={user.id}
            initialValues={{ displayName: user.displayName, callsign: user.callsign }}
            onSubmit={(values) => updateProfile.mutateAsync(values)}
          />
        ) : null}
      </Card>
      <Card>
        <Text variant="heading">Appearance</Text>
        <Text tone="muted">“System” follows your device’s light or dark setting.</Text>
        <SegmentedChoice label="Theme" options={themeOptions} value={preference} onChange={setPreference} />
      </Card>
      <Card>
        <Text variant="heading">Session</Text>
        {signOut.isError ? <Notice message={signOut.error.message} /> : null}
        <Button label="Sign out" variant="secondary" busy={signOut.isPending} onPress={() => signOut.mutate()} style={styles.signOut} />
      </Card>
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
  signOut: { alignSelf: 'flex-start' },
});

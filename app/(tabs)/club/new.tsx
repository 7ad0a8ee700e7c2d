import { router, Stack } from 'expo-router';

import { ClubForm } from '@/components/clubs/club-form';
import { useCreateClubMutation } from '@/components/clubs/queries';
import { Card } from '@/components/ui/card';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { layout } from '@/components/ui/theme';
import { ScreenTitle } from '@/components/ui/screen-title';

export default function NewClubRoute() {
  const create = useCreateClubMutation();
  return (
    <Screen maxWidth={layout.maxFormWidth + 120}>
      <Stack.Screen options={{ title: 'New club' }} />
      <ScreenTitle>Start a club</ScreenTitle>
      <Text tone="muted">You become its admin: you invite members, review their stations and keep them apart on the air.</Text>
      <Card>
        <ClubForm
          onSubmit={async (values) => {
            const club = await create.mutateAsync(values);
            router.replace({ pathname: '/club/[clubId]', params: { clubId: String(club.id) } });
          }}
        />
      </Card>
    </Screen>
  );
}

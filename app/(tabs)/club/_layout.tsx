import { Stack } from 'expo-router';

import { useStackScreenOptions } from '@/components/ui/stack-options';

export const unstable_settings = { initialRouteName: 'index' };

export default function ClubLayoutRoute() {
  const screenOptions = useStackScreenOptions();
  return (
    <Stack screenOptions={screenOptions}>
      <Stack.Screen name="index" options={{ headerShown: false, title: 'Club · Faintline' }} />
      <Stack.Screen name="new" options={{ title: 'New club' }} />
      <Stack.Screen name="[clubId]/index" options={{ title: 'Members' }} />
      <Stack.Screen name="[clubId]/review" options={{ title: 'Station review' }} />
      <Stack.Screen name="[clubId]/conflicts" options={{ title: 'Collisions' }} />
      <Stack.Screen name="[clubId]/occupancy" options={{ title: 'Band use' }} />
      <Stack.Screen name="[clubId]/log" options={{ title: 'Club log' }} />
      <Stack.Screen name="station/[id]" options={{ title: 'Member station' }} />
    </Stack>
  );
}

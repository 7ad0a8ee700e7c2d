import { Stack } from 'expo-router';

import { useStackScreenOptions } from '@/components/ui/stack-options';

export const unstable_settings = { initialRouteName: 'index' };

export default function ReceiversLayoutRoute() {
  const screenOptions = useStackScreenOptions();
  return (
    <Stack screenOptions={screenOptions}>
      <Stack.Screen name="index" options={{ headerShown: false, title: 'Listening posts · Faintline' }} />
      <Stack.Screen name="new" options={{ title: 'New listening post' }} />
      <Stack.Screen name="import" options={{ title: 'Import reports' }} />
    </Stack>
  );
}

import { Stack } from 'expo-router';

import { useStackScreenOptions } from '@/components/ui/stack-options';

export const unstable_settings = { initialRouteName: 'index' };

export default function HealthLayoutRoute() {
  const screenOptions = useStackScreenOptions();
  return (
    <Stack screenOptions={screenOptions}>
      <Stack.Screen name="index" options={{ headerShown: false, title: 'Fleet health · Faintline' }} />
      <Stack.Screen name="[id]" options={{ title: 'Station health' }} />
    </Stack>
  );
}

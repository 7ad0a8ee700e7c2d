import { Stack } from 'expo-router';

import { useStackScreenOptions } from '@/components/ui/stack-options';

export const unstable_settings = { initialRouteName: 'index' };

export default function UnitsLayoutRoute() {
  const screenOptions = useStackScreenOptions();
  return (
    <Stack screenOptions={screenOptions}>
      <Stack.Screen name="index" options={{ headerShown: false, title: 'Units · Faintline' }} />
      <Stack.Screen name="new" options={{ title: 'New unit' }} />
      <Stack.Screen name="[id]" options={{ title: 'Unit' }} />
      <Stack.Screen name="[id]/edit" options={{ title: 'Edit unit' }} />
    </Stack>
  );
}

import { Stack } from 'expo-router';

import { useStackScreenOptions } from '@/components/ui/stack-options';

export const unstable_settings = { initialRouteName: 'index' };

export default function StationsLayoutRoute() {
  const screenOptions = useStackScreenOptions();
  return (
    <Stack screenOptions={screenOptions}>
      <Stack.Screen name="index" options={{ headerShown: false, title: 'Stations · Faintline' }} />
      <Stack.Screen name="new" options={{ title: 'New station' }} />
      <Stack.Screen name="[id]" options={{ title: 'Station' }} />
      <Stack.Screen name="[id]/edit" options={{ title: 'Edit station' }} />
      <Stack.Screen name="[id]/bands" options={{ title: 'Station · bands' }} />
      <Stack.Screen name="[id]/calibrate" options={{ title: 'Station · calibration' }} />
      <Stack.Screen name="[id]/on-air" options={{ title: 'Station · on the air' }} />
      <Stack.Screen name="[id]/results" options={{ title: 'Station · results' }} />
    </Stack>
  );
}

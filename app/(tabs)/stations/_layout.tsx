import { Stack } from 'expo-router';

import { fonts } from '@/components/ui/theme';
import { useAppTheme } from '@/components/ui/theme-provider';

export const unstable_settings = { initialRouteName: 'index' };

export default function StationsLayoutRoute() {
  const { colors } = useAppTheme();
  return (
    <Stack
      screenOptions={{
        headerStyle: { backgroundColor: colors.background },
        headerShadowVisible: false,
        headerTintColor: colors.primary,
        headerTitleStyle: { fontFamily: fonts.medium, color: colors.text },
        contentStyle: { backgroundColor: colors.background },
      }}
    >
      <Stack.Screen name="index" options={{ headerShown: false, title: 'Stations · Faintline' }} />
      <Stack.Screen name="new" options={{ title: 'New station' }} />
      <Stack.Screen name="[id]" options={{ title: 'Station' }} />
      <Stack.Screen name="[id]/edit" options={{ title: 'Edit station' }} />
      <Stack.Screen name="[id]/bands" options={{ title: 'Station · bands' }} />
      <Stack.Screen name="[id]/calibrate" options={{ title: 'Station · calibration' }} />
      <Stack.Screen name="[id]/on-air" options={{ title: 'Station · on the air' }} />
    </Stack>
  );
}

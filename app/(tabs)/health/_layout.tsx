import { Stack } from 'expo-router';

import { fonts } from '@/components/ui/theme';
import { useAppTheme } from '@/components/ui/theme-provider';

export const unstable_settings = { initialRouteName: 'index' };

export default function HealthLayoutRoute() {
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
      <Stack.Screen name="index" options={{ headerShown: false, title: 'Fleet health · Faintline' }} />
      <Stack.Screen name="[id]" options={{ title: 'Station health' }} />
    </Stack>
  );
}

import { Stack } from 'expo-router';

import { fonts } from '@/components/ui/theme';
import { useAppTheme } from '@/components/ui/theme-provider';

export const unstable_settings = { initialRouteName: 'index' };

export default function UnitsLayoutRoute() {
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
      <Stack.Screen name="index" options={{ headerShown: false, title: 'Units · Faintline' }} />
      <Stack.Screen name="new" options={{ title: 'New unit' }} />
      <Stack.Screen name="[id]" options={{ title: 'Unit' }} />
      <Stack.Screen name="[id]/edit" options={{ title: 'Edit unit' }} />
    </Stack>
  );
}

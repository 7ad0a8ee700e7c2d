import { Tabs } from 'expo-router/js-tabs';

import { useSessionQuery } from '@/components/auth/queries';
import { ShellHeader, ShellNav } from '@/components/shell/shell-nav';
import { useBreakpoints } from '@/components/ui/breakpoints';
import { useAppTheme } from '@/components/ui/theme-provider';

export default function TabsLayoutRoute() {
  const { isWide } = useBreakpoints();
  const { colors } = useAppTheme();
  const user = useSessionQuery().data;
  const isClubMember = !!user?.clubs.length;
  return (
    <Tabs
      tabBar={(props) => <ShellNav {...props} variant={isWide ? 'rail' : 'bottom'} />}
      screenOptions={{
        tabBarPosition: isWide ? 'left' : 'bottom',
        // phones: a header strip with the mark and the live UTC clock; wide screens keep both in the rail
        headerShown: !isWide,
        header: () => <ShellHeader />,
        sceneStyle: { backgroundColor: colors.background },
      }}
    >
      <Tabs.Screen name="index" options={{ title: 'Overview · Faintline' }} />
      <Tabs.Screen name="stations" options={{ title: 'Stations · Faintline' }} />
      <Tabs.Screen name="units" options={{ title: 'Units · Faintline' }} />
      <Tabs.Protected guard={isClubMember}>
        <Tabs.Screen name="club" options={{ title: 'Club · Faintline' }} />
      </Tabs.Protected>
      <Tabs.Screen name="settings" options={{ title: 'Settings · Faintline' }} />
    </Tabs>
  );
}

import { Tabs } from 'expo-router/js-tabs';

import { useSessionQuery } from '@/components/auth/queries';
import { NoticeBell } from '@/components/notices/notice-bell';
import { unreadCount, useNoticesQuery } from '@/components/notices/queries';
import { ShellHeader, ShellNav } from '@/components/shell/shell-nav';
import { useBreakpoints } from '@/components/ui/breakpoints';
import { useAppTheme } from '@/components/ui/theme-provider';

export default function TabsLayoutRoute() {
  const { isWide } = useBreakpoints();
  const { colors } = useAppTheme();
  const user = useSessionQuery().data;
  const unread = unreadCount(useNoticesQuery(!!user).data);
  return (
    <Tabs
      tabBar={(props) => (
        <ShellNav {...props} variant={isWide ? 'rail' : 'bottom'} accessory={<NoticeBell unread={unread} variant="row" />} />
      )}
      screenOptions={{
        tabBarPosition: isWide ? 'left' : 'bottom',
        // phones: a header strip with the mark and the live UTC clock; wide screens keep both in the rail
        headerShown: !isWide,
        header: () => <ShellHeader accessory={<NoticeBell unread={unread} variant="icon" />} />,
        sceneStyle: { backgroundColor: colors.background },
      }}
    >
      <Tabs.Screen name="index" options={{ title: 'Overview · Faintline' }} />
      <Tabs.Screen name="stations" options={{ title: 'Stations · Faintline' }} />
      <Tabs.Screen name="units" options={{ title: 'Units · Faintline' }} />
      <Tabs.Screen name="health" options={{ title: 'Health · Faintline' }} />
      {/* every operator may start a club, so the tab is always there */}
      <Tabs.Screen name="club" options={{ title: 'Club · Faintline' }} />
      <Tabs.Screen name="settings" options={{ title: 'Settings · Faintline' }} />
      {/* no tab of their own (not in shellTabs): reached from the notice bell, the Club tab, Stations and the overview */}
      <Tabs.Screen name="notices" options={{ title: 'Notices · Faintline' }} />
      <Tabs.Screen name="proposals" options={{ title: 'Offset proposals · Faintline' }} />
      <Tabs.Screen name="activity" options={{ title: 'Your activity log · Faintline' }} />
      <Tabs.Screen name="receivers" options={{ title: 'Listening posts · Faintline' }} />
      <Tabs.Screen name="compare" options={{ title: 'Compare · Faintline' }} />
      <Tabs.Screen name="help" options={{ title: 'Help · Faintline' }} />
    </Tabs>
  );
}

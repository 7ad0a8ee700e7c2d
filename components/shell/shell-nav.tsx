import type { BottomTabBarProps } from 'expo-router/js-tabs';
import type { ReactNode } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';

import { Wordmark } from '../brand/faintline-mark';
import { Text } from '../ui/text';
import { layout, radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { NavIcon, type NavIconName } from './nav-icon';
import { UtcClock } from './utc-clock';

/** Tab route name → label and icon. Routes not listed here get no tab. */
export const shellTabs: Record<string, { label: string; icon: NavIconName }> = {
  index: { label: 'Overview', icon: 'overview' },
  stations: { label: 'Stations', icon: 'stations' },
  units: { label: 'Units', icon: 'units' },
  health: { label: 'Health', icon: 'health' },
  club: { label: 'Club', icon: 'club' },
  settings: { label: 'Settings', icon: 'settings' },
};

export type ShellNavProps = BottomTabBarProps & {
  variant: 'bottom' | 'rail';
  now?: () => number;
  /** Drawn below the rail's tabs (the notice bell); not shown in the bottom bar. */
  accessory?: ReactNode;
};

/** The signed-in navigation: a 56 px bottom bar on phones, a side rail with the clock on wide screens. */
export function ShellNav({ state, navigation, variant, now, accessory }: ShellNavProps) {
  const { colors } = useAppTheme();
  const insets = useSafeAreaInsets();
  const rail = variant === 'rail';
  const items = state.routes.map((route, index) => ({ route, index, tab: shellTabs[route.name] })).filter((item) => item.tab);

  const buttons = items.map(({ route, index, tab }) => {
    const focused = state.index === index;
    const color = focused ? colors.primary : colors.textMuted;
    const onPress = () => {
      const event = navigation.emit({ type: 'tabPress', target: route.key, canPreventDefault: true });
      if (!focused && !event.defaultPrevented) navigation.navigate(route.name, route.params);
    };
    return (
      <Pressable
        key={route.key}
        role="tab"
        aria-label={tab.label}
        aria-selected={focused}
        onPress={onPress}
        style={({ hovered }: { pressed: boolean; hovered?: boolean }) => [
          rail ? styles.railItem : styles.barItem,
          rail && focused && { backgroundColor: colors.primarySoft },
          rail && hovered && !focused && { backgroundColor: colors.surfaceRaised },
        ]}
      >
        <NavIcon name={tab.icon} color={color} />
        <Text variant={rail ? 'label' : 'caption'} style={[{ color }, !rail && styles.barLabel]}>
          {tab.label}
        </Text>
        {!rail && focused ? <View style={[styles.barMarker, { backgroundColor: colors.signal }]} /> : null}
      </Pressable>
    );
  });

  if (rail) {
    return (
      <View
        role="navigation"
        aria-label="Main"
        style={[styles.rail, { backgroundColor: colors.surface, borderColor: colors.border, paddingTop: insets.top + space.xl }]}
      >
        <View style={styles.railBrand}>
          <Wordmark />
        </View>
        <UtcClock variant="panel" now={now} />
        {/* only the tabs sit in the tab list; the mark and clock stay outside it */}
        <View accessibilityRole="tablist" style={styles.railItems}>
          {buttons}
        </View>
        {accessory ? <View style={[styles.railAccessory, { borderColor: colors.border }]}>{accessory}</View> : null}
      </View>
    );
  }
  return (
    <View
      role="navigation"
      aria-label="Main"
      style={[
        styles.bar,
        {
          backgroundColor: colors.surface,
          borderColor: colors.border,
          height: layout.tabBarHeight + insets.bottom,
          paddingBottom: insets.bottom,
        },
      ]}
    >
      <View accessibilityRole="tablist" style={styles.barItems}>
        {buttons}
      </View>
    </View>
  );
}

/** The phone header strip: the mark on the left, the live UTC clock on the right. */
export function ShellHeader({ now, accessory }: { now?: () => number; accessory?: ReactNode }) {
  const { colors } = useAppTheme();
  const insets = useSafeAreaInsets();
  return (
    <View style={[styles.header, { backgroundColor: colors.surface, borderColor: colors.border, paddingTop: insets.top + space.sm }]}>
      <Wordmark />
      <View style={styles.headerEnd}>
        <UtcClock variant="strip" now={now} />
        {accessory}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  bar: { borderTopWidth: 1 },
  barItems: { flex: 1, flexDirection: 'row' },
  barItem: { flex: 1, alignItems: 'center', justifyContent: 'center', gap: 2, paddingTop: 4 },
  barLabel: { fontSize: 12, lineHeight: 16 },
  barMarker: { position: 'absolute', top: 0, width: 28, height: 3, borderBottomLeftRadius: 3, borderBottomRightRadius: 3 },
  rail: { width: layout.sideRailWidth, borderRightWidth: 1, paddingHorizontal: space.lg, gap: space.xl },
  railBrand: { paddingHorizontal: space.xs },
  railItems: { gap: space.xs },
  railAccessory: { borderTopWidth: 1, paddingTop: space.md },
  headerEnd: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  railItem: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.md,
    paddingHorizontal: space.md,
    paddingVertical: space.md,
    borderRadius: radius.md,
  },
  header: {
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'space-between',
    paddingHorizontal: space.lg,
    paddingBottom: space.sm,
    borderBottomWidth: 1,
    gap: space.md,
  },
});

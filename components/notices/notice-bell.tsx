import { Link } from 'expo-router';
import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import Svg, { Path } from 'react-native-svg';

import { Text } from '../ui/text';
import { fonts, radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';

export type NoticeBellProps = { unread: number; variant: 'icon' | 'row' };

/** The way to the notices, with the unread count: an icon in the phone header, a row in the side rail. */
export function NoticeBell({ unread, variant }: NoticeBellProps) {
  const { colors } = useAppTheme();
  const [hovered, setHovered] = useState(false);
  const label = unread ? `Notices, ${unread} unread` : 'Notices';
  const icon = (
    <Svg width={22} height={22} viewBox="0 0 24 24" fill="none">
      <Path d="M6 16 V11 A6 6 0 0 1 18 11 V16 L19.5 18 H4.5 Z" stroke={colors.textMuted} strokeWidth={1.7} strokeLinejoin="round" />
      <Path d="M10 20.5 A2.2 2.2 0 0 0 14 20.5" stroke={colors.textMuted} strokeWidth={1.7} strokeLinecap="round" />
    </Svg>
  );
  const badge = unread ? (
    <View style={[styles.badge, { backgroundColor: colors.signal }, variant === 'icon' && styles.badgeOnIcon]}>
      <Text style={[styles.badgeText, { color: colors.onSignal }]}>{unread > 99 ? '99+' : unread}</Text>
    </View>
  ) : null;
  return (
    <Link href="/notices" asChild>
      <Pressable
        accessibilityRole="link"
        // the row is named by what it shows ("Notices 2" and, for screen readers only, "unread"); the icon needs a label
        accessibilityLabel={variant === 'icon' ? label : undefined}
        hitSlop={8}
        onHoverIn={() => setHovered(true)}
        onHoverOut={() => setHovered(false)}
        // Link's asChild spreads the child's style into an object: pass one flat object
        style={StyleSheet.flatten([variant === 'icon' ? styles.icon : styles.row, hovered && { backgroundColor: colors.surfaceRaised }])}
      >
        {icon}
        {variant === 'row' ? (
          <Text variant="label" tone="muted" style={styles.rowLabel}>
            Notices
          </Text>
        ) : null}
        {badge}
        {variant === 'row' && unread ? <Text style={styles.screenReaderOnly}> unread</Text> : null}
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  screenReaderOnly: { position: 'absolute', width: 1, height: 1, overflow: 'hidden', opacity: 0 },
  icon: { width: 40, height: 40, alignItems: 'center', justifyContent: 'center', borderRadius: radius.pill },
  row: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.md,
    paddingHorizontal: space.md,
    paddingVertical: space.md,
    borderRadius: radius.md,
  },
  rowLabel: { flex: 1 },
  badge: { minWidth: 20, height: 20, borderRadius: 10, paddingHorizontal: 5, alignItems: 'center', justifyContent: 'center' },
  badgeOnIcon: { position: 'absolute', top: 2, right: 0 },
  badgeText: { fontFamily: fonts.monoMedium, fontSize: 11, lineHeight: 14 },
});

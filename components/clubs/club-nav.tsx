import { Link, type Href } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';

import { Text } from '../ui/text';
import { radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { ScreenTitle } from '../ui/screen-title';

export type ClubSection = 'members' | 'review' | 'conflicts' | 'occupancy' | 'reach' | 'log';

const sections: { key: ClubSection; label: string; adminOnly: boolean }[] = [
  { key: 'members', label: 'Members', adminOnly: false },
  { key: 'review', label: 'Review', adminOnly: true },
  { key: 'conflicts', label: 'Collisions', adminOnly: true },
  { key: 'occupancy', label: 'Band use', adminOnly: true },
  { key: 'reach', label: 'Reach', adminOnly: true },
  { key: 'log', label: 'Log', adminOnly: true },
];

export function clubSectionHref(clubId: number, section: ClubSection): Href {
  const id = String(clubId);
  switch (section) {
    case 'members':
      return { pathname: '/club/[clubId]', params: { clubId: id } };
    case 'review':
      return { pathname: '/club/[clubId]/review', params: { clubId: id } };
    case 'conflicts':
      return { pathname: '/club/[clubId]/conflicts', params: { clubId: id } };
    case 'occupancy':
      return { pathname: '/club/[clubId]/occupancy', params: { clubId: id } };
    case 'reach':
      return { pathname: '/club/[clubId]/reach', params: { clubId: id } };
    case 'log':
      return { pathname: '/club/[clubId]/log', params: { clubId: id } };
  }
}

export type ClubNavProps = { clubId: number; clubName: string; current: ClubSection; isAdmin: boolean };

/** The club's name and its sections as a row of links (wraps on a narrow phone, so none hides off-screen). */
export function ClubNav({ clubId, clubName, current, isAdmin }: ClubNavProps) {
  const { colors } = useAppTheme();
  const shown = sections.filter((section) => isAdmin || !section.adminOnly);
  return (
    <View style={styles.wrap}>
      <ScreenTitle>{clubName}</ScreenTitle>
      {shown.length > 1 ? (
        <View style={styles.row}>
          {shown.map((section) => {
            const selected = section.key === current;
            return (
              <Link key={section.key} href={clubSectionHref(clubId, section.key)} replace asChild>
                <Pressable
                  accessibilityRole="link"
                  accessibilityLabel={`${section.label} of ${clubName}`}
                  aria-current={selected ? 'page' : undefined}
                  // Link's asChild spreads the child's style into an object: pass one flat object
                  style={StyleSheet.flatten([
                    styles.item,
                    { borderColor: selected ? colors.primary : colors.border },
                    selected && { backgroundColor: colors.primarySoft },
                  ])}
                >
                  <Text variant="label" tone={selected ? 'primary' : 'muted'}>
                    {section.label}
                  </Text>
                </Pressable>
              </Link>
            );
          })}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  item: { borderWidth: 1, borderRadius: radius.pill, paddingHorizontal: space.md, paddingVertical: 6 },
});

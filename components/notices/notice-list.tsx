import { StyleSheet, View } from 'react-native';

import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { formatUtcDateTime } from '../ui/format';
import { space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import type { AppNotice } from './queries';

export type NoticeListProps = {
  notices: AppNotice[];
  /** Opens the notice's link (and marks it read). */
  onOpen: (notice: AppNotice) => void;
  onMarkRead: (notice: AppNotice) => void;
};

export function NoticeList({ notices, onOpen, onMarkRead }: NoticeListProps) {
  const { colors } = useAppTheme();
  return (
    <View style={styles.list}>
      {notices.map((notice) => {
        const unread = !notice.readAt;
        return (
          <Card key={notice.id} style={[styles.card, unread && { borderLeftWidth: 4, borderLeftColor: colors.signal }]}>
            <View style={styles.head}>
              <Text variant="caption" tone={unread ? 'signal' : 'muted'}>
                {unread ? 'New' : 'Read'}
              </Text>
              <Text variant="mono" tone="muted" style={styles.time}>
                {formatUtcDateTime(notice.createdAt)}
              </Text>
            </View>
            <Text tone={unread ? 'default' : 'muted'}>{notice.message}</Text>
            <View style={styles.actions}>
              {notice.link ? (
                <Button
                  label="Open"
                  variant="secondary"
                  accessibilityLabel={`Open: ${notice.message}`}
                  onPress={() => onOpen(notice)}
                  style={styles.small}
                />
              ) : null}
              {unread ? (
                <Button
                  label="Mark as read"
                  variant="ghost"
                  accessibilityLabel={`Mark as read: ${notice.message}`}
                  onPress={() => onMarkRead(notice)}
                  style={styles.small}
                />
              ) : null}
            </View>
          </Card>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  card: { gap: space.xs, paddingVertical: space.md },
  head: { flexDirection: 'row', justifyContent: 'space-between', flexWrap: 'wrap', gap: space.sm },
  time: { fontSize: 13 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  small: { minHeight: 38, paddingHorizontal: space.md },
});

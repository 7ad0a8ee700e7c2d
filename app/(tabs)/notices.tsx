import { router, type Href } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { NoticeList } from '@/components/notices/notice-list';
import {
  unreadCount,
  useMarkAllNoticesReadMutation,
  useMarkNoticeReadMutation,
  useNoticesQuery,
  type AppNotice,
} from '@/components/notices/queries';
import { Button } from '@/components/ui/button';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/query-states';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { TextLink } from '@/components/ui/text-link';
import { space } from '@/components/ui/theme';
import { ScreenTitle } from '@/components/ui/screen-title';

export default function NoticesRoute() {
  const notices = useNoticesQuery();
  const markRead = useMarkNoticeReadMutation();
  const markAll = useMarkAllNoticesReadMutation();
  const read = (notice: AppNotice) => {
    if (!notice.readAt) markRead.mutate(notice.id);
  };
  let body;
  if (notices.isPending) body = <LoadingState label="Loading your notices…" />;
  else if (notices.isError)
    body = <ErrorState title="The notices could not be loaded" error={notices.error} onRetry={() => notices.refetch()} />;
  else if (notices.data.length === 0)
    body = <EmptyState title="Nothing new" message="Club invitations, offset proposals and suspensions of your stations show up here." />;
  else
    body = (
      <NoticeList
        notices={notices.data}
        onMarkRead={read}
        onOpen={(notice) => {
          read(notice);
          if (notice.link) router.push(notice.link as Href);
        }}
      />
    );
  const unread = unreadCount(notices.data);
  return (
    <Screen>
      <ScreenTitle>Notices</ScreenTitle>
      <View style={styles.unread}>
        <Text tone="muted">{unread ? `${unread} unread.` : 'You have read everything.'}</Text>
        {unread ? <Button label="Mark all read" variant="secondary" busy={markAll.isPending} onPress={() => markAll.mutate()} /> : null}
      </View>
      <View style={styles.links}>
        <TextLink href="/proposals" label="Offset proposals" />
        <TextLink href="/activity" label="Your activity log" />
      </View>
      {body}
    </Screen>
  );
}

const styles = StyleSheet.create({
  links: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  unread: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.md },
});

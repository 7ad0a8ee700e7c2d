import { StyleSheet, View } from 'react-native';

import type { ListeningPost } from '@/shared/api/receptions';

import { formatCount } from '../receptions/format';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { formatUtcDateTime } from '../ui/format';
import { Text } from '../ui/text';
import { space } from '../ui/theme';

export type ListeningPostListProps = {
  posts: ListeningPost[];
  issuingId: number | null;
  onIssueToken: (post: ListeningPost) => void;
  onDelete: (post: ListeningPost) => void;
};

/** The operator's receive-only stations, each with its token state and what it has reported. */
export function ListeningPostList({ posts, issuingId, onIssueToken, onDelete }: ListeningPostListProps) {
  return (
    <View style={styles.list}>
      {posts.map((post) => (
        <Card key={post.id}>
          <View style={styles.head}>
            <Text variant="heading" style={styles.grow}>
              {post.name}
            </Text>
            <Text variant="mono" tone="primary">
              {post.callsign}
            </Text>
          </View>
          <Text tone="muted">
            Listens at <Text variant="mono">{post.locator}</Text> · {formatCount(post.reports)} report{post.reports === 1 ? '' : 's'} ·{' '}
            {post.lastReportAt ? `last at ${formatUtcDateTime(post.lastReportAt)}` : 'nothing reported yet'}
          </Text>
          <Text variant="caption" tone="muted">
            {post.hasToken && post.tokenIssuedAt
              ? `Token issued ${formatUtcDateTime(post.tokenIssuedAt)}`
              : 'No token yet: it cannot report'}
          </Text>
          <View style={styles.actions}>
            <Button
              label={post.hasToken ? 'Replace token' : 'Issue a token'}
              accessibilityLabel={`${post.hasToken ? 'Replace token' : 'Issue a token'} for ${post.name}`}
              variant="secondary"
              busy={issuingId === post.id}
              onPress={() => onIssueToken(post)}
            />
            <Button label="Delete" accessibilityLabel={`Delete ${post.name}`} variant="danger" onPress={() => onDelete(post)} />
          </View>
        </Card>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.md },
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  grow: { flexGrow: 1 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, marginTop: space.xs },
});

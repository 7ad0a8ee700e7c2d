import { Stack, useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { ImportProgress } from '@/components/imports/import-progress';
import { useImportsQuery } from '@/components/imports/queries';
import { FreshListeningToken } from '@/components/listening-posts/fresh-token';
import { ListeningPostList } from '@/components/listening-posts/listening-post-list';
import { pageOrigin } from '@/components/listening-posts/origin';
import {
  useDeleteListeningPostMutation,
  useIssueListeningPostTokenMutation,
  useListeningPostsQuery,
} from '@/components/listening-posts/queries';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { Notice } from '@/components/ui/notice';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/query-states';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { space } from '@/components/ui/theme';
import type { ListeningPost } from '@/shared/api/receptions';
import { Heading } from '@/components/ui/heading';
import { ScreenTitle } from '@/components/ui/screen-title';

type Pending = { kind: 'rotate' | 'delete'; post: ListeningPost } | null;

export default function ListeningPostsRoute() {
  const router = useRouter();
  const posts = useListeningPostsQuery();
  const imports = useImportsQuery();
  const issue = useIssueListeningPostTokenMutation();
  const remove = useDeleteListeningPostMutation();
  const [pending, setPending] = useState<Pending>(null);
  const [fresh, setFresh] = useState<{ name: string; token: string } | null>(null);

  const issueFor = (post: ListeningPost) =>
    issue.mutate(post.id, {
      onSuccess: ({ token }) => {
        setPending(null);
        setFresh({ name: post.name, token });
      },
    });

  let list;
  if (posts.isPending) list = <LoadingState label="Loading your listening posts…" />;
  else if (posts.isError)
    list = <ErrorState title="Listening posts could not be loaded" error={posts.error} onRetry={() => posts.refetch()} />;
  else if (posts.data.length === 0)
    list = (
      <EmptyState
        title="No listening posts yet"
        message="A listening post is a receiver of yours that decodes WSPR and posts each decode here with its own token."
        action={<Button label="Add a listening post" onPress={() => router.push('/receivers/new')} />}
      />
    );
  else
    list = (
      <ListeningPostList
        posts={posts.data}
        issuingId={issue.isPending ? (issue.variables ?? null) : null}
        onIssueToken={(post) => (post.hasToken ? setPending({ kind: 'rotate', post }) : issueFor(post))}
        onDelete={(post) => setPending({ kind: 'delete', post })}
      />
    );

  const close = () => {
    issue.reset();
    remove.reset();
    setPending(null);
  };
  return (
    <Screen
      overlay={
        <ConfirmDialog
          visible={pending !== null}
          title={pending?.kind === 'delete' ? `Delete “${pending.post.name}”?` : 'Replace the token?'}
          message={
            pending?.kind === 'delete'
              ? 'Its token stops working at once. Reports it already sent stay with your results.'
              : `The token “${pending?.post.name ?? ''}” uses now stops working at once; the receiver needs the new one.`
          }
          confirmLabel={pending?.kind === 'delete' ? 'Delete listening post' : 'Replace token'}
          destructive
          busy={issue.isPending || remove.isPending}
          error={(pending?.kind === 'delete' ? remove.error : issue.error)?.message}
          onCancel={close}
          onConfirm={() => {
            if (!pending) return;
            if (pending.kind === 'rotate') issueFor(pending.post);
            else remove.mutate(pending.post.id, { onSuccess: () => setPending(null) });
          }}
        />
      }
    >
      <Stack.Screen options={{ title: 'Listening posts · Faintline' }} />
      <View style={styles.heading}>
        <ScreenTitle>Listening posts and imports</ScreenTitle>
        <Text tone="muted">Reception reports reach Faintline from your receivers, or from files of reports you import.</Text>
      </View>
      <View style={styles.actions}>
        <Button label="Add a listening post" onPress={() => router.push('/receivers/new')} />
        <Button label="Import a file of reports" variant="secondary" onPress={() => router.push('/receivers/import')} />
      </View>
      {issue.isError && !pending ? <Notice message={issue.error.message} /> : null}
      {fresh ? <FreshListeningToken postName={fresh.name} token={fresh.token} origin={pageOrigin()} onDone={() => setFresh(null)} /> : null}
      {list}
      <Heading level={2}>Recent imports</Heading>
      {imports.isPending ? (
        <LoadingState label="Loading your imports…" />
      ) : imports.isError ? (
        <ErrorState title="Imports could not be loaded" error={imports.error} onRetry={() => imports.refetch()} />
      ) : imports.data.length === 0 ? (
        <Text tone="muted">No imports yet.</Text>
      ) : (
        imports.data.slice(0, 10).map((job) => <ImportProgress key={job.id} job={job} />)
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  heading: { gap: space.xs },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});

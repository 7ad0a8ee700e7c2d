import { useRouter } from 'expo-router';
import { useState } from 'react';
import { View } from 'react-native';

import { FreshListeningToken } from '@/components/listening-posts/fresh-token';
import { ListeningPostForm } from '@/components/listening-posts/listening-post-form';
import { pageOrigin } from '@/components/listening-posts/origin';
import { useCreateListeningPostMutation, useIssueListeningPostTokenMutation } from '@/components/listening-posts/queries';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { layout } from '@/components/ui/theme';
import { ScreenTitle } from '@/components/ui/screen-title';

export default function NewListeningPostRoute() {
  const router = useRouter();
  const create = useCreateListeningPostMutation();
  const issue = useIssueListeningPostTokenMutation();
  const [issued, setIssued] = useState<{ name: string; token: string } | null>(null);
  const [tokenError, setTokenError] = useState<string | null>(null);
  const leave = () => (router.canGoBack() ? router.back() : router.replace('/receivers'));
  return (
    <Screen maxWidth={layout.maxFormWidth + 280}>
      <View>
        <ScreenTitle>New listening post</ScreenTitle>
        <Text tone="muted">A receiver of yours that posts what it decodes. It gets its own token, shown once.</Text>
      </View>
      {issued ? (
        <FreshListeningToken
          postName={issued.name}
          token={issued.token}
          origin={pageOrigin()}
          onDone={() => router.replace('/receivers')}
        />
      ) : (
        <>
          {tokenError ? <Notice message={tokenError} /> : null}
          <ListeningPostForm
            onCancel={leave}
            onSubmit={async (values) => {
              const post = await create.mutateAsync(values);
              try {
                const { token } = await issue.mutateAsync(post.id);
                setIssued({ name: post.name, token });
              } catch (error) {
                setTokenError(
                  `The listening post was added, but its token could not be issued (${(error as Error).message}). Issue it from the list.`,
                );
              }
            }}
          />
        </>
      )}
    </Screen>
  );
}

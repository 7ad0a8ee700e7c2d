import { useQueryClient } from '@tanstack/react-query';
import { Stack, useLocalSearchParams } from 'expo-router';
import { useState } from 'react';

import { LazyCompareForm, LazyComparisonView } from '@/components/analyses/lazy-parts';
import { fetchComparison, useComparableStations, useComparisonQuery, type ComparisonRequest } from '@/components/analyses/queries';
import { useSessionQuery } from '@/components/auth/queries';
import { Card } from '@/components/ui/card';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/query-states';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { Text } from '@/components/ui/text';

export default function CompareRoute() {
  const startWith = Number(useLocalSearchParams<{ a?: string }>().a);
  const user = useSessionQuery().data;
  const stations = useComparableStations(user?.id, user?.adminOfClubIds ?? []);
  const queryClient = useQueryClient();
  const [request, setRequest] = useState<ComparisonRequest | null>(null);
  const comparison = useComparisonQuery(request);

  let body;
  if (stations.isError)
    body = <ErrorState title="Your stations could not be loaded" error={stations.error} onRetry={() => stations.refetch()} />;
  else if (!stations.data) body = <LoadingState label="Loading your stations…" />;
  else if (stations.data.length === 0)
    body = (
      <EmptyState title="No stations yet" message="Add a station first; then compare it with another, or with itself in another period." />
    );
  else
    body = (
      <>
        <Card>
          <LazyCompareForm
            stations={stations.data}
            startWith={Number.isInteger(startWith) && startWith > 0 ? startWith : null}
            onCompare={async (next) => {
              await fetchComparison(queryClient, next);
              setRequest(next);
            }}
          />
        </Card>
        {comparison.data ? <LazyComparisonView comparison={comparison.data} /> : null}
      </>
    );
  return (
    <Screen maxWidth={1040}>
      <Stack.Screen options={{ title: 'Compare · Faintline' }} />
      <ScreenTitle>Compare</ScreenTitle>
      <Text tone="muted">
        Which antenna, station or period is heard better? Only reports of the same receiver at the same UTC hour count, with SNR referred to
        1 W, so power makes no difference.
      </Text>
      {body}
    </Screen>
  );
}

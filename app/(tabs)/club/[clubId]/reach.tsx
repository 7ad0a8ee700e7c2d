import { Stack, useLocalSearchParams } from 'expo-router';
import { useState } from 'react';

import { LazyClubReachView } from '@/components/analyses/lazy-parts';
import { useClubReachQuery } from '@/components/analyses/queries';
import { ClubNav } from '@/components/clubs/club-nav';
import { useClubQuery } from '@/components/clubs/queries';
import { PERIOD_OPTIONS, rollingRange, type PeriodChoice } from '@/components/receptions/period';
import { useBreakpoints } from '@/components/ui/breakpoints';
import { ChoiceChips } from '@/components/ui/choice-chips';
import { formatUtcDateTime } from '@/components/ui/format';
import { ErrorState, LoadingState } from '@/components/ui/query-states';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';

type Rolling = Exclude<PeriodChoice, 'custom'>;

export default function ClubReachRoute() {
  const clubId = Number(useLocalSearchParams<{ clubId: string }>().clubId);
  const { isWide } = useBreakpoints();
  const club = useClubQuery(clubId);
  const [period, setPeriod] = useState<Rolling>('7d');
  const [range, setRange] = useState(() => rollingRange('7d', Date.now()));
  const reach = useClubReachQuery(clubId, range);
  let body;
  if (reach.isPending) body = <LoadingState label="Gathering the club’s reports…" />;
  else if (reach.isError && !reach.data)
    body = <ErrorState title="The club’s reach could not be loaded" error={reach.error} onRetry={() => reach.refetch()} />;
  else if (reach.data) body = <LazyClubReachView reach={reach.data} wide={isWide} />;
  const name = club.data?.name ?? 'Club';
  return (
    <Screen maxWidth={1240}>
      <Stack.Screen options={{ title: `${name} · Reach` }} />
      <ClubNav clubId={clubId} clubName={name} current="reach" isAdmin />
      <Text tone="muted">
        How far the members’ stations were heard and what their listening posts heard
        {reach.data ? `, ${formatUtcDateTime(reach.data.from)} to ${formatUtcDateTime(reach.data.to)}` : ''}.
      </Text>
      <ChoiceChips<Rolling>
        label="Period (UTC)"
        options={PERIOD_OPTIONS.filter((o): o is { value: Rolling; label: string } => o.value !== 'custom')}
        value={period}
        onChange={(next) => {
          setPeriod(next);
          setRange(rollingRange(next, Date.now()));
        }}
      />
      {body}
    </Screen>
  );
}

import type { UseQueryResult } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import type { StationHealth } from '@/shared/schemas';

import { useBreakpoints } from '../ui/breakpoints';
import { Button } from '../ui/button';
import { formatUtcClock } from '../ui/format';
import { Notice } from '../ui/notice';
import { EmptyState, ErrorState, LoadingState } from '../ui/query-states';
import { Screen } from '../ui/screen';
import { Text } from '../ui/text';
import { space } from '../ui/theme';
import { FleetHealth } from './fleet-health';
import { fleetSummary } from './words';
import { ScreenTitle } from '../ui/screen-title';

export type FleetHealthScreenProps = {
  title: string;
  intro: string;
  query: Pick<UseQueryResult<StationHealth[]>, 'data' | 'isPending' | 'isError' | 'error' | 'refetch' | 'dataUpdatedAt' | 'isRefetchError'>;
  emptyTitle: string;
  emptyMessage: string;
  emptyActionLabel?: string;
  onEmptyAction?: () => void;
  onOpenStation: (stationId: number) => void;
  onOpenDevice?: (stationId: number) => void;
  ownerOf?: (stationId: number) => string | undefined;
  clubLink?: { label: string; onPress: () => void };
  /** drawn between the title and the fleet (the club chooser) */
  header?: ReactNode;
};

/** The fleet page shared by an operator's own fleet and a club's: title, live summary, the states, the fleet. */
export function FleetHealthScreen({
  title,
  intro,
  query,
  emptyTitle,
  emptyMessage,
  emptyActionLabel,
  onEmptyAction,
  onOpenStation,
  onOpenDevice,
  ownerOf,
  clubLink,
  header,
}: FleetHealthScreenProps) {
  const { isTablet } = useBreakpoints();
  let body: ReactNode;
  if (query.isPending) body = <LoadingState label="Loading fleet health…" />;
  else if (query.isError && !query.data)
    body = <ErrorState title="Fleet health could not be loaded" error={query.error} onRetry={() => query.refetch()} />;
  else if (!query.data || query.data.length === 0)
    body = (
      <EmptyState
        title={emptyTitle}
        message={emptyMessage}
        action={emptyActionLabel && onEmptyAction ? <Button label={emptyActionLabel} onPress={onEmptyAction} /> : undefined}
      />
    );
  else
    body = (
      <>
        <View style={styles.summary}>
          <Text variant="label">{fleetSummary(query.data)}</Text>
          <Text variant="caption" tone="muted">
            Updated {formatUtcClock(query.dataUpdatedAt)}
          </Text>
        </View>
        {query.isRefetchError ? <Notice tone="info" message="The last refresh failed; showing the previous answer. Retrying…" /> : null}
        <FleetHealth
          fleet={query.data}
          layout={isTablet ? 'table' : 'cards'}
          onOpenStation={onOpenStation}
          onOpenDevice={onOpenDevice}
          ownerOf={ownerOf}
        />
      </>
    );
  return (
    <Screen maxWidth={1120}>
      <View style={styles.titleRow}>
        <View style={styles.titleBlock}>
          <ScreenTitle>{title}</ScreenTitle>
          <Text tone="muted">{intro}</Text>
        </View>
        {clubLink ? <Button label={clubLink.label} variant="secondary" onPress={clubLink.onPress} style={styles.clubLink} /> : null}
      </View>
      {header}
      {body}
    </Screen>
  );
}

const styles = StyleSheet.create({
  titleRow: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', alignItems: 'flex-start', gap: space.md },
  titleBlock: { gap: space.xs, flexShrink: 1, minWidth: 240 },
  summary: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', alignItems: 'baseline', gap: space.sm },
  clubLink: { alignSelf: 'flex-start' },
});

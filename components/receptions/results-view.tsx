import type { Href } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View, type LayoutChangeEvent } from 'react-native';

import type { Reach, ReceptionPage } from '@/shared/api/receptions';

import { LazyWorldMap } from '../map/lazy-world-map';
import { Card } from '../ui/card';
import { formatUtcDateTime } from '../ui/format';
import { ErrorState, LoadingState } from '../ui/query-states';
import { Text } from '../ui/text';
import { TextLink } from '../ui/text-link';
import { space } from '../ui/theme';
import { DownloadLink } from '../workshop/download-link';
import { LazyReceptionCharts } from './lazy-parts';
import type { ReceptionSort } from './queries';
import { ReachFigures } from './reach-figures';
import { ReceptionTable } from './reception-table';
import { ResultsEmpty } from './results-empty';
import { ResultsFilters, type ResultsFiltersProps } from './results-filters';
import { Heading } from '../ui/heading';
import { ScreenTitle } from '../ui/screen-title';

type QueryView<T> = { data: T | undefined; isPending: boolean; isFetching: boolean; error: Error | null; refetch: () => unknown };

export type ResultsViewProps = {
  stationName: string;
  callsign: string;
  wide: boolean;
  filters: ResultsFiltersProps;
  reach: QueryView<Reach>;
  page: QueryView<ReceptionPage>;
  sort: ReceptionSort;
  order: 'asc' | 'desc';
  onSort: (sort: ReceptionSort, order: 'asc' | 'desc') => void;
  onPage: (page: number) => void;
  csvHref: string;
  csvFileName: string;
  /** the Compare screen with this station as A */
  compareHref?: Href;
};

function useWidth(initial: number): [number, (event: LayoutChangeEvent) => void] {
  const [width, setWidth] = useState(initial);
  return [width, (event) => setWidth(Math.floor(event.nativeEvent.layout.width))];
}

/** A station's reception results: filters, figures, map, charts and the reports themselves. */
export function ResultsView(props: ResultsViewProps) {
  const { stationName, callsign, wide, filters, reach, page } = props;
  const [mapWidth, onMapLayout] = useWidth(wide ? 560 : 340);
  const [chartWidth, onChartLayout] = useWidth(wide ? 880 : 340);
  const filtered = filters.bandId !== null || filters.period !== '30d';

  let body;
  if (reach.isPending) body = <LoadingState label="Gathering the reports…" />;
  else if (reach.error && !reach.data)
    body = <ErrorState title="The results could not be loaded" error={reach.error} onRetry={() => reach.refetch()} />;
  else if (reach.data && reach.data.reports === 0) body = <ResultsEmpty filtered={filtered} />;
  else if (reach.data) {
    const data = reach.data;
    body = (
      <>
        <View style={[styles.top, wide && styles.topWide]}>
          <Card style={[styles.mapCard, wide && styles.mapWide]}>
            <Heading level={2}>Who heard it</Heading>
            <View onLayout={onMapLayout}>
              {mapWidth > 0 ? (
                <LazyWorldMap station={data.station} receivers={data.mapReceivers} width={mapWidth} bandId={data.bandId} />
              ) : null}
            </View>
          </Card>
          <View style={[styles.figures, wide && styles.figuresWide]}>
            <ReachFigures reach={data} />
          </View>
        </View>
        <Card>
          <View onLayout={onChartLayout}>
            {chartWidth > 0 ? <LazyReceptionCharts hourBand={data.hourBand} snrByDistance={data.snrByDistance} width={chartWidth} /> : null}
          </View>
        </Card>
        <Card>
          <View style={styles.tableHead}>
            <Heading level={2} style={styles.grow}>
              Every report
            </Heading>
            <DownloadLink href={props.csvHref} label="Export CSV" fileName={props.csvFileName} />
          </View>
          {page.data ? (
            <ReceptionTable
              page={page.data}
              sort={props.sort}
              order={props.order}
              wide={wide}
              busy={page.isFetching}
              onSort={props.onSort}
              onPage={props.onPage}
            />
          ) : page.error ? (
            <ErrorState title="The reports could not be loaded" error={page.error} onRetry={() => page.refetch()} />
          ) : (
            <LoadingState label="Loading the reports…" />
          )}
        </Card>
      </>
    );
  }

  return (
    <>
      <View style={styles.heading}>
        <ScreenTitle>{`Who heard ${stationName}`}</ScreenTitle>
        <Text tone="muted">
          <Text variant="mono">{callsign}</Text> · {formatUtcDateTime(filters.fromIso)} to {formatUtcDateTime(filters.toIso)}
        </Text>
      </View>
      <ResultsFilters {...filters} />
      {props.compareHref ? <TextLink href={props.compareHref} label="Compare with another station or period" /> : null}
      {body}
    </>
  );
}

const styles = StyleSheet.create({
  heading: { gap: space.xs },
  top: { gap: space.lg },
  topWide: { flexDirection: 'row', alignItems: 'flex-start' },
  mapCard: { gap: space.sm },
  mapWide: { flex: 3, minWidth: 0 },
  figures: {},
  figuresWide: { flex: 2, minWidth: 0 },
  tableHead: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.md },
  grow: { flexGrow: 1 },
});

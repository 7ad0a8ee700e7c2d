/** The hour × band strips, loaded on first use through the one chart chunk. */
import { lazy, Suspense, type ComponentProps } from 'react';

import { LoadingState } from '../ui/query-states';
import { LazyBoundary } from '../workshop/lazy-boundary';

const Chart = lazy(() => import('../charts/all-charts').then((m) => ({ default: m.HourBandChart })));

export function LazyHourBandChart(props: ComponentProps<typeof Chart>) {
  return (
    <LazyBoundary what="chart">
      <Suspense fallback={<LoadingState label="Drawing the chart…" />}>
        <Chart {...props} />
      </Suspense>
    </LazyBoundary>
  );
}

/** The results charts, loaded on first use through the one chart chunk. */
import { lazy, Suspense, type ComponentProps } from 'react';

import { LoadingState } from '../ui/query-states';
import { LazyBoundary } from '../workshop/lazy-boundary';

const Charts = lazy(() => import('../charts/all-charts').then((m) => ({ default: m.ReceptionCharts })));

export function LazyReceptionCharts(props: ComponentProps<typeof Charts>) {
  return (
    <LazyBoundary what="charts">
      <Suspense fallback={<LoadingState label="Drawing the charts…" />}>
        <Charts {...props} />
      </Suspense>
    </LazyBoundary>
  );
}

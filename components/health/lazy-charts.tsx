/** The 24-hour charts, loaded on first use so the chart library stays out of the entry bundle. */
import { lazy, Suspense, type ComponentProps } from 'react';

import { LoadingState } from '../ui/query-states';

const Charts = lazy(() => import('../charts/all-charts').then((m) => ({ default: m.HealthCharts })));

export function LazyHealthCharts(props: ComponentProps<typeof Charts>) {
  return (
    <Suspense fallback={<LoadingState label="Drawing the charts…" />}>
      <Charts {...props} />
    </Suspense>
  );
}

/** The world map in its own lazy chunk: d3-geo and the coastlines load when a results screen first draws it. */
import { lazy, Suspense, type ComponentProps } from 'react';

import { LazyBoundary } from '../workshop/lazy-boundary';
import { LoadingState } from '../ui/query-states';

const WorldMap = lazy(() => import('./world-map'));

export function LazyWorldMap(props: ComponentProps<typeof WorldMap>) {
  return (
    <LazyBoundary what="world map">
      <Suspense fallback={<LoadingState label="Drawing the map…" />}>
        <WorldMap {...props} />
      </Suspense>
    </LazyBoundary>
  );
}

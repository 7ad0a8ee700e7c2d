/** The unit screens' larger pieces, loaded on first use so the entry bundle stays small. */
import { lazy, Suspense, type ComponentProps } from 'react';

import { LoadingState } from '../ui/query-states';
import { LazyBoundary } from '../workshop/lazy-boundary';

const UnitForm = lazy(() => import('./unit-form').then((m) => ({ default: m.UnitForm })));
const UnitDetails = lazy(() => import('./unit-details').then((m) => ({ default: m.UnitDetails })));

export function LazyUnitForm(props: ComponentProps<typeof UnitForm>) {
  return (
    <LazyBoundary what="unit form">
      <Suspense fallback={<LoadingState label="Opening the form…" />}>
        <UnitForm {...props} />
      </Suspense>
    </LazyBoundary>
  );
}

export function LazyUnitDetails(props: ComponentProps<typeof UnitDetails>) {
  return (
    <LazyBoundary what="unit details">
      <Suspense fallback={<LoadingState label="Loading the unit’s details…" />}>
        <UnitDetails {...props} />
      </Suspense>
    </LazyBoundary>
  );
}

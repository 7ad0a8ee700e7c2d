/** The analyses' screens' pieces, loaded on first use so the entry bundle stays small. */
import { lazy, Suspense, type ComponentProps } from 'react';

import { LoadingState } from '../ui/query-states';
import { LazyBoundary } from '../workshop/lazy-boundary';

const CompareForm = lazy(() => import('./compare-form').then((m) => ({ default: m.CompareForm })));
const ComparisonView = lazy(() => import('./comparison-view').then((m) => ({ default: m.ComparisonView })));
const ClubReachView = lazy(() => import('./club-reach-view').then((m) => ({ default: m.ClubReachView })));

export function LazyCompareForm(props: ComponentProps<typeof CompareForm>) {
  return (
    <LazyBoundary what="comparison form">
      <Suspense fallback={<LoadingState label="Opening the form…" />}>
        <CompareForm {...props} />
      </Suspense>
    </LazyBoundary>
  );
}

export function LazyComparisonView(props: ComponentProps<typeof ComparisonView>) {
  return (
    <LazyBoundary what="comparison">
      <Suspense fallback={<LoadingState label="Laying out the comparison…" />}>
        <ComparisonView {...props} />
      </Suspense>
    </LazyBoundary>
  );
}

export function LazyClubReachView(props: ComponentProps<typeof ClubReachView>) {
  return (
    <LazyBoundary what="club's reach">
      <Suspense fallback={<LoadingState label="Laying out the club’s reach…" />}>
        <ClubReachView {...props} />
      </Suspense>
    </LazyBoundary>
  );
}

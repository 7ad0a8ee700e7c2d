/** The club's review table loads on first use, so the entry bundle stays small. */
import { lazy, Suspense, type ComponentProps } from 'react';

import { LoadingState } from '../ui/query-states';

const ReviewTable = lazy(() => import('./review-table').then((m) => ({ default: m.ReviewTable })));

export function LazyReviewTable(props: ComponentProps<typeof ReviewTable>) {
  return (
    <Suspense fallback={<LoadingState label="Loading the review…" />}>
      <ReviewTable {...props} />
    </Suspense>
  );
}

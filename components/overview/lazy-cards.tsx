/** The overview's first-run checklist and club summaries load on first use, so the entry bundle stays small. */
import { lazy, Suspense, type ComponentProps } from 'react';

const FirstStepsCard = lazy(() => import('./first-steps-card').then((m) => ({ default: m.FirstStepsCard })));
const ClubSummaryCard = lazy(() => import('./club-summary-card').then((m) => ({ default: m.ClubSummaryCard })));

export function LazyFirstStepsCard() {
  return (
    <Suspense fallback={null}>
      <FirstStepsCard />
    </Suspense>
  );
}

export function LazyClubSummaryCard(props: ComponentProps<typeof ClubSummaryCard>) {
  return (
    <Suspense fallback={null}>
      <ClubSummaryCard {...props} />
    </Suspense>
  );
}

/** The Help screen's text loads on first use, so the entry bundle stays small. */
import { lazy, Suspense, type ComponentProps } from 'react';

import { LoadingState } from '../ui/query-states';
import { LazyBoundary } from '../workshop/lazy-boundary';

const HelpView = lazy(() => import('./help-view').then((m) => ({ default: m.HelpView })));

export function LazyHelpView(props: ComponentProps<typeof HelpView>) {
  return (
    <LazyBoundary what="help">
      <Suspense fallback={<LoadingState label="Loading the help…" />}>
        <HelpView {...props} />
      </Suspense>
    </LazyBoundary>
  );
}

import { lazy, Suspense } from 'react';

import { LoadingState } from '@/components/ui/query-states';
import { Screen } from '@/components/ui/screen';
import { LazyBoundary } from '@/components/workshop/lazy-boundary';

// The import screen (file reading, column mapping) loads on first use, so the entry bundle stays small.
const ImportReportsScreen = lazy(() =>
  import('@/components/imports/import-reports-screen').then((m) => ({ default: m.ImportReportsScreen })),
);

export default function ImportReportsRoute() {
  return (
    <LazyBoundary what="report import">
      <Suspense
        fallback={
          <Screen>
            <LoadingState label="Loading the import…" />
          </Screen>
        }
      >
        <ImportReportsScreen />
      </Suspense>
    </LazyBoundary>
  );
}

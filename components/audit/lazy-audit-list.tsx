/** The change log's list (with its sentence builder) loads on first use, so the entry bundle stays small. */
import { lazy, Suspense, type ComponentProps } from 'react';

import { LoadingState } from '../ui/query-states';

const AuditList = lazy(() => import('./audit-list').then((m) => ({ default: m.AuditList })));

export function LazyAuditList(props: ComponentProps<typeof AuditList>) {
  return (
    <Suspense fallback={<LoadingState label="Loading the changes…" />}>
      <AuditList {...props} />
    </Suspense>
  );
}

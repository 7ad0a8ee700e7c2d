/**
 * The schedule screens' larger pieces, loaded on first use so the entry bundle stays small
 * (the routes themselves are part of the entry).
 */
import { lazy, Suspense, type ComponentProps } from 'react';

import { LoadingState } from '../ui/query-states';

const Editor = lazy(() => import('./schedule-editor').then((m) => ({ default: m.ScheduleEditor })));
const PreviewPanel = lazy(() => import('./schedule-preview-panel').then((m) => ({ default: m.SchedulePreviewPanel })));
const Summary = lazy(() => import('./schedule-summary').then((m) => ({ default: m.ScheduleSummary })));
const Empty = lazy(() => import('./schedule-empty').then((m) => ({ default: m.ScheduleEmpty })));

export function LazyScheduleEditor(props: ComponentProps<typeof Editor>) {
  return (
    <Suspense fallback={<LoadingState label="Opening the editor…" />}>
      <Editor {...props} />
    </Suspense>
  );
}

export function LazySchedulePreviewPanel(props: ComponentProps<typeof PreviewPanel>) {
  return (
    <Suspense fallback={<LoadingState label="Drawing the preview…" />}>
      <PreviewPanel {...props} />
    </Suspense>
  );
}

export function LazyScheduleSummary(props: ComponentProps<typeof Summary>) {
  return (
    <Suspense fallback={<LoadingState label="Loading the schedule…" />}>
      <Summary {...props} />
    </Suspense>
  );
}

export function LazyScheduleEmpty(props: ComponentProps<typeof Empty>) {
  return (
    <Suspense fallback={<LoadingState label="Loading…" />}>
      <Empty {...props} />
    </Suspense>
  );
}

/**
 * The workshop's larger pieces (they pull in the encoder, the synthesizer planner and the filter
 * models), loaded on first use so the entry bundle stays small; the routes themselves are in the entry.
 */
import { lazy, Suspense, type ComponentProps } from 'react';

import { LoadingState } from '../ui/query-states';
import { LazyBoundary } from './lazy-boundary';

const StationWorkshop = lazy(() => import('./station-workshop').then((m) => ({ default: m.StationWorkshop })));
const BandList = lazy(() => import('./band-list').then((m) => ({ default: m.BandList })));
const CalibrationForm = lazy(() => import('./calibration-form').then((m) => ({ default: m.CalibrationForm })));
const TypedOffsetsForm = lazy(() => import('./typed-offsets-form').then((m) => ({ default: m.TypedOffsetsForm })));
const OnAirView = lazy(() => import('./on-air-view').then((m) => ({ default: m.OnAirView })));

export function LazyStationWorkshop(props: ComponentProps<typeof StationWorkshop>) {
  return (
    <LazyBoundary what="station summary">
      <Suspense fallback={<LoadingState label="Working out the station’s power and messages…" />}>
        <StationWorkshop {...props} />
      </Suspense>
    </LazyBoundary>
  );
}

export function LazyBandList(props: ComponentProps<typeof BandList>) {
  return (
    <LazyBoundary what="band list">
      <Suspense fallback={<LoadingState label="Drawing the bands…" />}>
        <BandList {...props} />
      </Suspense>
    </LazyBoundary>
  );
}

export function LazyCalibrationForm(props: ComponentProps<typeof CalibrationForm>) {
  return (
    <LazyBoundary what="measurement form">
      <Suspense fallback={<LoadingState label="Opening the measurement…" />}>
        <CalibrationForm {...props} />
      </Suspense>
    </LazyBoundary>
  );
}

export function LazyTypedOffsetsForm(props: ComponentProps<typeof TypedOffsetsForm>) {
  return (
    <LazyBoundary what="offsets form">
      <Suspense fallback={<LoadingState label="Opening the offsets…" />}>
        <TypedOffsetsForm {...props} />
      </Suspense>
    </LazyBoundary>
  );
}

export function LazyOnAirView(props: ComponentProps<typeof OnAirView>) {
  return (
    <LazyBoundary what="on-air detail">
      <Suspense fallback={<LoadingState label="Working out what goes on the air…" />}>
        <OnAirView {...props} />
      </Suspense>
    </LazyBoundary>
  );
}

const ReportsCalibration = lazy(() => import('./reports-calibration').then((m) => ({ default: m.ReportsCalibration })));

export function LazyReportsCalibration(props: ComponentProps<typeof ReportsCalibration>) {
  return (
    <LazyBoundary what="calibration from reports">
      <Suspense fallback={<LoadingState label="Opening the reports…" />}>
        <ReportsCalibration {...props} />
      </Suspense>
    </LazyBoundary>
  );
}

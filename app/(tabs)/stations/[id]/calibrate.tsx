import { useRouter } from 'expo-router';
import { useState } from 'react';

import { useSessionQuery } from '@/components/auth/queries';
import { QueryBoundary } from '@/components/query/query-boundary';
import { useRouteId } from '@/components/query/use-route-id';
import { useStationQuery } from '@/components/stations/queries';
import { useUnitQuery } from '@/components/units/queries';
import { Card } from '@/components/ui/card';
import { Screen } from '@/components/ui/screen';
import { SegmentedChoice } from '@/components/ui/segmented-choice';
import {
  LazyCalibrationForm as CalibrationForm,
  LazyReportsCalibration as ReportsCalibration,
  LazyTypedOffsetsForm as TypedOffsetsForm,
} from '@/components/workshop/lazy-parts';
import { useCalibrationProposalMutation, useSaveCalibrationMutation } from '@/components/workshop/queries';
import { WorkshopHeader } from '@/components/workshop/workshop-header';
import { bandFor, bandsFor, type BandId } from '@/shared/domain/bands';
import { filterCoverage } from '@/shared/domain/workshop/coverage';

export default function StationCalibrateRoute() {
  const router = useRouter();
  const { id: stationId, raw: id, valid } = useRouteId();
  const me = useSessionQuery().data;
  const station = useStationQuery(stationId);
  const unit = useUnitQuery(station.data?.unitId);
  const propose = useCalibrationProposalMutation(stationId);
  const save = useSaveCalibrationMutation(stationId);
  const [mode, setMode] = useState<'measure' | 'typed' | 'reports'>('measure');
  const toBands = () => router.replace({ pathname: '/stations/[id]/bands', params: { id } });

  return (
    <Screen maxWidth={720}>
      <QueryBoundary
        query={station}
        noun="station"
        validId={valid}
        loadingLabel="Loading the station…"
        alongside={[{ query: unit, errorTitle: 'The station’s unit could not be loaded' }]}
        refuse={(data) => (data.ownerId === me?.id ? null : `This station belongs to ${data.ownerName}; only its owner can calibrate it.`)}
      >
        {(data) => {
          // lowest band first, as everywhere else
          const order = bandsFor(data.region).map((band) => band.id as string);
          const enabled = data.bands.filter((b) => b.enabled).sort((a, b) => order.indexOf(a.bandId) - order.indexOf(b.bandId));
          // bands worth measuring: enabled ones whose filter covers them
          const measurable = enabled
            .map((b) => b.bandId as BandId)
            .filter((bandId) => {
              const found = bandFor(bandId, data.region);
              return found.ok && unit.data ? filterCoverage(unit.data.filters, found.band).covered : false;
            });
          return (
            <>
              <WorkshopHeader
                title="Calibrate"
                station={data}
                intro={
                  data.referenceErrorPpm === null
                    ? 'No measurement yet. Measure once on one band; the same crystal error carries over to every band.'
                    : `Last measured reference error: ${data.referenceErrorPpm.toFixed(3)} ppm.`
                }
              />
              <SegmentedChoice
                label="How to calibrate"
                value={mode}
                onChange={setMode}
                options={[
                  { value: 'measure', label: 'Measure' },
                  { value: 'typed', label: 'Type in' },
                  { value: 'reports', label: 'From reports' },
                ]}
              />
              <Card>
                {mode === 'measure' ? (
                  <CalibrationForm
                    region={data.region}
                    audioOffsetHz={data.audioOffsetHz}
                    bandIds={measurable}
                    onPropose={(measurement) => propose.mutateAsync(measurement)}
                    onAccept={async (input) => {
                      await save.mutateAsync(input);
                      toBands();
                    }}
                  />
                ) : mode === 'reports' ? (
                  <ReportsCalibration station={data} unit={unit.data ?? null} />
                ) : (
                  <TypedOffsetsForm region={data.region} bands={enabled} onSave={(input) => save.mutateAsync(input)} />
                )}
              </Card>
            </>
          );
        }}
      </QueryBoundary>
    </Screen>
  );
}

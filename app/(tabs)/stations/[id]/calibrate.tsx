import { useLocalSearchParams, useRouter } from 'expo-router';
import { useState } from 'react';

import { useSessionQuery } from '@/components/auth/queries';
import { useStationQuery } from '@/components/stations/queries';
import { useUnitQuery } from '@/components/units/queries';
import { Card } from '@/components/ui/card';
import { ErrorState, LoadingState } from '@/components/ui/query-states';
import { Screen } from '@/components/ui/screen';
import { SegmentedChoice } from '@/components/ui/segmented-choice';
import { LazyCalibrationForm as CalibrationForm, LazyTypedOffsetsForm as TypedOffsetsForm } from '@/components/workshop/lazy-parts';
import { useCalibrationProposalMutation, useSaveCalibrationMutation } from '@/components/workshop/queries';
import { WorkshopHeader } from '@/components/workshop/workshop-header';
import { bandFor, bandsFor, type BandId } from '@/shared/domain/bands';
import { filterCoverage } from '@/shared/domain/workshop/coverage';

export default function StationCalibrateRoute() {
  const router = useRouter();
  const { id } = useLocalSearchParams<{ id: string }>();
  const stationId = Number(id);
  const me = useSessionQuery().data;
  const station = useStationQuery(stationId);
  const unit = useUnitQuery(station.data?.unitId);
  const propose = useCalibrationProposalMutation(stationId);
  const save = useSaveCalibrationMutation(stationId);
  const [mode, setMode] = useState<'measure' | 'typed'>('measure');
  const toBands = () => router.replace({ pathname: '/stations/[id]/bands', params: { id } });

  let body;
  if (station.isPending || (station.data?.unitId != null && unit.isPending)) body = <LoadingState label="Loading the station…" />;
  else if (station.isError)
    body = <ErrorState title="The station could not be loaded" error={station.error} onRetry={() => station.refetch()} />;
  else if (station.data.ownerId !== me?.id)
    body = (
      <ErrorState
        title="Read-only"
        error={new Error(`This station belongs to ${station.data.ownerName}; only its owner can calibrate it.`)}
      />
    );
  else {
    // lowest band first, as everywhere else
    const order = bandsFor(station.data.region).map((band) => band.id as string);
    const enabled = station.data.bands.filter((b) => b.enabled).sort((a, b) => order.indexOf(a.bandId) - order.indexOf(b.bandId));
    // bands worth measuring: enabled ones whose filter covers them
    const measurable = enabled
      .map((b) => b.bandId as BandId)
      .filter((bandId) => {
        const found = bandFor(bandId, station.data.region);
        return found.ok && unit.data ? filterCoverage(unit.data.filters, found.band).covered : false;
      });
    body = (
      <>
        <WorkshopHeader
          title="Calibrate"
          station={station.data}
          intro={
            station.data.referenceErrorPpm === null
              ? 'No measurement yet. Measure once on one band; the same crystal error carries over to every band.'
              : `Last measured reference error: ${station.data.referenceErrorPpm.toFixed(3)} ppm.`
          }
        />
        <SegmentedChoice
          label="How to calibrate"
          value={mode}
          onChange={setMode}
          options={[
            { value: 'measure', label: 'Guided measurement' },
            { value: 'typed', label: 'Type offsets' },
          ]}
        />
        <Card>
          {mode === 'measure' ? (
            <CalibrationForm
              region={station.data.region}
              audioOffsetHz={station.data.audioOffsetHz}
              bandIds={measurable}
              onPropose={(measurement) => propose.mutateAsync(measurement)}
              onAccept={async (input) => {
                await save.mutateAsync(input);
                toBands();
              }}
            />
          ) : (
            <TypedOffsetsForm region={station.data.region} bands={enabled} onSave={(input) => save.mutateAsync(input)} />
          )}
        </Card>
      </>
    );
  }
  return <Screen maxWidth={720}>{body}</Screen>;
}

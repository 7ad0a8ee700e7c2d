import { useLocalSearchParams, useRouter } from 'expo-router';

import { useStationQuery } from '@/components/stations/queries';
import { useUnitQuery } from '@/components/units/queries';
import { QueryBoundary } from '@/components/query/query-boundary';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { LazyOnAirView as OnAirView } from '@/components/workshop/lazy-parts';
import { WorkshopHeader } from '@/components/workshop/workshop-header';
import { bandsFor, isBandId, type BandId } from '@/shared/domain/bands';

export default function StationOnAirRoute() {
  const router = useRouter();
  const { id, band } = useLocalSearchParams<{ id: string; band?: string }>();
  const stationId = Number(id);
  const validId = Number.isInteger(stationId) && stationId > 0;
  const station = useStationQuery(stationId);
  const unit = useUnitQuery(station.data?.unitId);

  return (
    <Screen>
      <QueryBoundary
        query={station}
        noun="station"
        validId={validId}
        loadingLabel="Working out what goes on the air…"
        alongside={[{ query: unit, errorTitle: 'The station’s unit could not be loaded' }]}
      >
        {(data) => {
          const order = bandsFor(data.region).map((b) => b.id);
          const enabled = data.bands
            .filter((b) => b.enabled)
            .map((b) => b.bandId as BandId)
            .sort((a, b) => order.indexOf(a) - order.indexOf(b));
          const asked = band && isBandId(band) ? band : undefined;
          const bandId = asked ?? enabled[0];
          const bandIds = asked && !enabled.includes(asked) ? [...enabled, asked] : enabled;
          return (
            <>
              <WorkshopHeader
                title="On-air detail"
                station={data}
                actions={[
                  {
                    label: 'Bands and calibration',
                    secondary: true,
                    onPress: () => router.push({ pathname: '/stations/[id]/bands', params: { id } }),
                  },
                ]}
              />
              {!unit.data ? (
                <Notice message="This station has no unit: assign its hardware first (edit the station)." />
              ) : !bandId ? (
                <Notice tone="info" message="No band is enabled yet. Enable one under Bands and calibration." />
              ) : (
                <OnAirView
                  station={data}
                  unit={unit.data}
                  bandId={bandId}
                  bandIds={bandIds}
                  onBand={(next) => router.setParams({ band: next })}
                />
              )}
            </>
          );
        }}
      </QueryBoundary>
    </Screen>
  );
}

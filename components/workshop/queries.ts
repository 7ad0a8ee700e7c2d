import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import type { CalibrationFromReports, CalibrationProposal, StabilityAnswer } from '@/shared/api/answers';
import { api } from '@/shared/api/client';
import type { BandId } from '@/shared/domain/bands';
import type { CalibrationInput, MeasurementInput, Station, StationBandInput } from '@/shared/schemas';

import { stationKeys } from '../stations/queries';

export type { CalibrationFromReports, CalibrationProposal };

export const fromReportsKey = (stationId: number) => ['calibration-from-reports', stationId] as const;

function useStationWrite<TInput>(stationId: number, request: (input: TInput) => Promise<Station>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: request,
    onSuccess: (station) => {
      queryClient.setQueryData(stationKeys.detail(stationId), station);
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: stationKeys.list() }),
        queryClient.invalidateQueries({ queryKey: fromReportsKey(stationId) }),
      ]);
    },
  });
}

export function useSetBandMutation(stationId: number) {
  return useStationWrite(stationId, ({ bandId, ...body }: StationBandInput & { bandId: BandId }) =>
    api<Station>(`/stations/${stationId}/bands/${bandId}`, { method: 'PUT', body }),
  );
}

export function useSaveCalibrationMutation(stationId: number) {
  return useStationWrite(stationId, (input: CalibrationInput) =>
    api<Station>(`/stations/${stationId}/calibration`, { method: 'POST', body: input }),
  );
}

export function useCalibrationProposalMutation(stationId: number) {
  return useMutation({
    mutationFn: (measurement: MeasurementInput) =>
      api<CalibrationProposal>(`/stations/${stationId}/calibration/proposal`, { method: 'POST', body: measurement }),
  });
}

/** The last 7 days' reports, per band: the median heard error and the offset it proposes. */
export function useCalibrationFromReportsQuery(stationId: number, enabled: boolean) {
  return useQuery({
    queryKey: fromReportsKey(stationId),
    queryFn: () => api<CalibrationFromReports>(`/stations/${stationId}/calibration/from-reports`),
    enabled: enabled && stationId > 0,
  });
}

/** The last 7 days' heard error and drift per transmission on the station's first enabled band, beside the unit's temperature. */
export function useStabilityQuery(stationId: number) {
  return useQuery({
    queryKey: ['stability', stationId] as const,
    queryFn: () => api<StabilityAnswer>(`/stations/${stationId}/stability`),
    enabled: stationId > 0,
  });
}

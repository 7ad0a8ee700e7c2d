import { useMutation, useQueryClient } from '@tanstack/react-query';

import type { CalibrationProposal } from '@/shared/api/answers';
import { api } from '@/shared/api/client';
import type { BandId } from '@/shared/domain/bands';
import type { CalibrationInput, MeasurementInput, Station, StationBandInput } from '@/shared/schemas';

import { stationKeys } from '../stations/queries';

export type { CalibrationProposal };

function useStationWrite<TInput>(stationId: number, request: (input: TInput) => Promise<Station>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: request,
    onSuccess: (station) => {
      queryClient.setQueryData(stationKeys.detail(stationId), station);
      return queryClient.invalidateQueries({ queryKey: stationKeys.list() });
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

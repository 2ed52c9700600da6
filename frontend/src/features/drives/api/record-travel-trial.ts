import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { LengthUnit } from '../../../lib/units';
import { travelTrialQueryOptions } from './get-travel-trial';
import { driveKeys, type ScaleMaterial, type TravelTrial } from '../types';

export interface TravelTrialInput {
  /** Commanded and measured moves. */
  lengthUnit: LengthUnit;
  /** Errors and residuals, and the instrument resolution. */
  readingUnit: LengthUnit;
  machineTemperature?: number;
  scaleTemperature?: number;
  scaleMaterial?: ScaleMaterial;
  instrumentResolution?: number;
  stepsPerMmUsed?: number;
  moves: { commanded: number; measured: number }[];
  throughOrigin?: boolean;
  notes?: string;
}

export function useRecordTravelTrial(axisId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: TravelTrialInput) => api.post<TravelTrial>(`/axes/${axisId}/travel-trials`, input),
    onSuccess: (saved: TravelTrial) => {
      // The answer is the record in full: the result above the list shows it without asking again.
      qc.setQueryData(travelTrialQueryOptions(axisId, saved.id).queryKey, saved);
      return Promise.all([qc.invalidateQueries({ queryKey: driveKeys.all }), qc.invalidateQueries({ queryKey: ['machines'] })]);
    },
  });
}

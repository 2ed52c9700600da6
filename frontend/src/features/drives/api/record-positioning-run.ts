import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { LengthUnit } from '../../../lib/units';
import { positioningRunQueryOptions } from './get-positioning-run';
import { driveKeys, type PositioningRun, type ScaleMaterial } from '../types';

export interface PositioningRunInput {
  /** Target positions. */
  lengthUnit: LengthUnit;
  /** Deviations and the instrument resolution. */
  readingUnit: LengthUnit;
  machineTemperature?: number;
  scaleTemperature?: number;
  scaleMaterial?: ScaleMaterial;
  instrumentResolution?: number;
  targets: number[];
  runs: { direction: 'up' | 'down'; deviations: number[] }[];
  notes?: string;
}

export function useRecordPositioningRun(axisId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: PositioningRunInput) => api.post<PositioningRun>(`/axes/${axisId}/positioning-runs`, input),
    onSuccess: (saved: PositioningRun) => {
      // The answer is the record in full: the result above the list shows it without asking again.
      qc.setQueryData(positioningRunQueryOptions(axisId, saved.id).queryKey, saved);
      return Promise.all([qc.invalidateQueries({ queryKey: driveKeys.all }), qc.invalidateQueries({ queryKey: ['machines'] })]);
    },
  });
}

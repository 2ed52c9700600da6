import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { LengthUnit } from '../../../lib/units';
import type { BacklashCheck, BacklashPosition } from '../backlash-types';
import { driveKeys } from '../types';

export interface BacklashInput {
  lengthUnit: LengthUnit;
  readingUnit: LengthUnit;
  positions: BacklashPosition[];
  resolution?: number;
  notes?: string;
}

export function useRecordBacklash(axisId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: BacklashInput) => api.post<BacklashCheck>(`/axes/${axisId}/backlash-checks`, input),
    onSuccess: () => Promise.all([qc.invalidateQueries({ queryKey: driveKeys.all }), qc.invalidateQueries({ queryKey: ['machines'] })]),
  });
}

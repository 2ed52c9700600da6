import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { LengthUnit } from '../../../lib/units';
import { frameKeys, type DiagonalCheck } from '../types';

export interface DiagonalCheckInput {
  sideX: number;
  sideY: number;
  diagonal1: number;
  diagonal2: number;
  gantrySpan?: number;
  /** Smallest step of the tape or rule, in lengthUnit. */
  resolution?: number;
  lengthUnit: LengthUnit;
  note?: string;
}

export function useCreateDiagonalCheck(machineId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: DiagonalCheckInput) => api.post<DiagonalCheck>(`/machines/${machineId}/diagonal-checks`, input),
    onSuccess: () => qc.invalidateQueries({ queryKey: frameKeys.diagonalChecks(machineId) }),
  });
}

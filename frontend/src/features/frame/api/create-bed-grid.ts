import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { LengthUnit } from '../../../lib/units';
import { frameKeys, type BedGrid } from '../types';

export interface BedGridInput {
  lengthUnit: LengthUnit;
  readingUnit: LengthUnit;
  /** Smallest step of the height gauge, in readingUnit. */
  resolution?: number;
  rows: number;
  columns: number;
  /** Positions in lengthUnit, heights in readingUnit, row by row. */
  points: { x: number; y: number; z: number }[];
  note?: string;
}

export function useCreateBedGrid(machineId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: BedGridInput) => api.post<BedGrid>(`/machines/${machineId}/bed-grids`, input),
    onSuccess: () => qc.invalidateQueries({ queryKey: frameKeys.bedGrids(machineId) }),
  });
}

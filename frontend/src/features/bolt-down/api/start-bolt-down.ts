import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { LengthUnit } from '../../../lib/units';
import { boltDownKeys, type BoltDown, type BoltDownMode } from '../types';

export interface StartBoltDownInput {
  mode: BoltDownMode;
  readingUnit: LengthUnit;
  /** Half-width of the on-target band in `readingUnit`; the server's default when absent. */
  band?: number;
}

export function useStartBoltDown(railId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: StartBoltDownInput) => api.post<BoltDown>(`/rails/${railId}/bolt-downs`, input),
    onSuccess: (bd) => {
      qc.setQueryData(boltDownKeys.detail(bd.id), bd);
      return qc.invalidateQueries({ queryKey: boltDownKeys.forRail(railId) });
    },
  });
}

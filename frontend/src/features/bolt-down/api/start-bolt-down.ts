import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Schemas } from '../../../lib/api/schemas';
import { boltDownKeys, type BoltDown } from '../types';

export type StartBoltDownInput = Schemas['CreateBoltDownDto'];

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

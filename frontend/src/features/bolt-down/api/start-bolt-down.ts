import { useMutation, useQueryClient } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import type { Schemas } from '../../../lib/api/schemas';
import { boltDownKeys } from '../types';

export type StartBoltDownInput = Schemas['CreateBoltDownDto'];

export function useStartBoltDown(railId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: StartBoltDownInput) =>
      answer(client.POST('/api/rails/{id}/bolt-downs', { params: { path: { id: railId } }, body })),
    onSuccess: (bd) => {
      qc.setQueryData(boltDownKeys.detail(bd.id), bd);
      return qc.invalidateQueries({ queryKey: boltDownKeys.forRail(railId) });
    },
  });
}

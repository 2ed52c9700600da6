import { useMutation, useQueryClient } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { MACHINE_STATE_KEYS } from '../../../lib/machine-state-keys';
import { boltDownKeys, type BoltDown } from '../types';

/** Gives a bolt-down up with a reason; needs the connection (it is a decision, not a reading). */
export function useAbandonBoltDown(bd: Pick<BoltDown, 'id' | 'railId'>) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (reason: string) =>
      answer(client.POST('/api/bolt-downs/{id}/abandon', { params: { path: { id: bd.id } }, body: { reason } })),
    onSuccess: async (fresh) => {
      qc.setQueryData(boltDownKeys.detail(bd.id), fresh);
      await Promise.all(
        [boltDownKeys.forRail(bd.railId), ...MACHINE_STATE_KEYS].map((queryKey) => qc.invalidateQueries({ queryKey })),
      );
    },
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import type { Schemas } from '../../../lib/api/schemas';
import { MACHINE_STATE_KEYS } from '../../../lib/machine-state-keys';
import { driveKeys } from '../types';

/** The fields to change; null clears the feed rate or the measured travel. */
export type AxisPatch = Schemas['UpdateAxisDto'];

export function useUpdateAxis(axisId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: AxisPatch) => answer(client.PATCH('/api/axes/{id}', { params: { path: { id: axisId } }, body })),
    onSuccess: (axis) => {
      qc.setQueryData(driveKeys.axis(axisId), axis);
      return Promise.all([
        qc.invalidateQueries({ queryKey: driveKeys.all }),
        ...MACHINE_STATE_KEYS.map((queryKey) => qc.invalidateQueries({ queryKey })),
      ]);
    },
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import type { Schemas } from '../../../lib/api/schemas';
import { MACHINE_STATE_KEYS } from '../../../lib/machine-state-keys';
import { driveKeys } from '../types';

/** A new axis: drive lengths, travel and feed rates (per minute) in its lengthUnit. */
export type NewAxis = Schemas['CreateAxisDto'];

export function useCreateAxis(machineId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: NewAxis) =>
      answer(client.POST('/api/machines/{id}/axes', { params: { path: { id: machineId } }, body })),
    onSuccess: () =>
      Promise.all([
        qc.invalidateQueries({ queryKey: driveKeys.all }),
        ...MACHINE_STATE_KEYS.map((queryKey) => qc.invalidateQueries({ queryKey })),
      ]),
  });
}

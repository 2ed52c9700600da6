import { useMutation, useQueryClient } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { MACHINE_STATE_KEYS } from '../../../lib/machine-state-keys';
import type { Schemas } from '../../../lib/api/schemas';
import { safetyKeys } from '../types';

export type SafetyItemInput = Schemas['CreateSafetyItemDto'];

/** Adds a workshop item, asked on every machine's walk. */
export function useAddSafetyItem() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: SafetyItemInput) => answer(client.POST('/api/safety-items', { body })),
    // A new item is asked on every walk: each machine's walk is unfinished again until it is answered.
    onSuccess: () =>
      Promise.all([safetyKeys.all, ...MACHINE_STATE_KEYS].map((queryKey) => qc.invalidateQueries({ queryKey }))),
  });
}

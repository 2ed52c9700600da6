import { useMutation, useQueryClient } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { machineKeys } from '../../../lib/machine-keys';
import type { Schemas } from '../../../lib/api/schemas';

export type CreateMachineInput = Schemas['CreateMachineDto'];

export function useCreateMachine() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateMachineInput) => answer(client.POST('/api/machines', { body })),
    onSuccess: () => qc.invalidateQueries({ queryKey: machineKeys.all }),
  });
}

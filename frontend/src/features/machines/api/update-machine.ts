import { useMutation, useQueryClient } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import type { Schemas } from '../../../lib/api/schemas';
import { machineKeys } from '../../../lib/machine-keys';

export function useUpdateMachine(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: Schemas['UpdateMachineDto']) =>
      answer(client.PATCH('/api/machines/{id}', { params: { path: { id } }, body })),
    onSuccess: (machine) => {
      qc.setQueryData(machineKeys.detail(id), machine);
      qc.invalidateQueries({ queryKey: machineKeys.all });
    },
  });
}

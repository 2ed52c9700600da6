import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { machineKeys } from '../../../lib/machine-keys';
import type { Machine } from '../types';
import type { CreateMachineInput } from './create-machine';

export function useUpdateMachine(id: string) {
  const qc = useQueryClient();
  return useMutation({
    // Untyped until the description gives UpdateMachineDto its fields.
    mutationFn: (patch: Partial<CreateMachineInput>) => api.patch<Machine>(`/machines/${id}`, patch),
    onSuccess: (machine) => {
      qc.setQueryData(machineKeys.detail(id), machine);
      qc.invalidateQueries({ queryKey: machineKeys.all });
    },
  });
}

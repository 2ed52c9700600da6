import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { machineKeys } from '../../../lib/machine-keys';
import type { Machine } from '../types';
import type { Schemas } from '../../../lib/api/schemas';

export type CreateMachineInput = Schemas['CreateMachineDto'];

export function useCreateMachine() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateMachineInput) => api.post<Machine>('/machines', input),
    onSuccess: () => qc.invalidateQueries({ queryKey: machineKeys.all }),
  });
}

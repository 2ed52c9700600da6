import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { machineKeys } from '../../../lib/machine-keys';
import type { Machine, MachineKind } from '../types';
import type { LengthUnit } from '../../../lib/units';

export interface CreateMachineInput {
  name: string;
  kind: MachineKind;
  lengthUnit: LengthUnit;
  workArea: { x: number; y: number };
  notes?: string;
  targetSetId?: string;
}

export function useCreateMachine() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateMachineInput) => api.post<Machine>('/machines', input),
    onSuccess: () => qc.invalidateQueries({ queryKey: machineKeys.all }),
  });
}

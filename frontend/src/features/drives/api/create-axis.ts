import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { MACHINE_STATE_KEYS } from '../../../lib/machine-state-keys';
import { driveKeys, type Axis, type Drive } from '../types';
import type { LengthUnit } from '../../../lib/units';

export interface AxisInput {
  name: string;
  /** Drive lengths, travel and feed rates (per minute) are in it. */
  lengthUnit: LengthUnit;
  drive: Drive;
  motorStepsPerRev: number;
  microsteps: number;
  gearRatio?: number;
  stepsPerMm: number;
  maxFeedRate?: number | null;
  measuredTravel?: number | null;
  notes?: string;
}

export function useCreateAxis(machineId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: AxisInput) => api.post<Axis>(`/machines/${machineId}/axes`, input),
    onSuccess: () =>
      Promise.all([
        qc.invalidateQueries({ queryKey: driveKeys.all }),
        ...MACHINE_STATE_KEYS.map((queryKey) => qc.invalidateQueries({ queryKey })),
      ]),
  });
}

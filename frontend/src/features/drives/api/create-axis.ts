import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { driveKeys, type Axis, type Drive } from '../types';

export interface AxisInput {
  name: string;
  drive: Drive;
  motorStepsPerRev: number;
  microsteps: number;
  gearRatio?: number;
  stepsPerMm: number;
  maxFeedRate?: number | null;
  measuredTravelMm?: number | null;
  notes?: string;
}

export function useCreateAxis(machineId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: AxisInput) => api.post<Axis>(`/machines/${machineId}/axes`, input),
    onSuccess: () => Promise.all([qc.invalidateQueries({ queryKey: driveKeys.all }), qc.invalidateQueries({ queryKey: ['machines'] })]),
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { LengthUnit } from '../../../lib/units';
import { frameKeys, type TestCut } from '../types';

export interface TestCutInput {
  lengthUnit: LengthUnit;
  /** Thickness of the plate cut, in lengthUnit. */
  plateThickness?: number;
  /** Smallest step of the caliper or rule, in lengthUnit. */
  resolution?: number;
  nominal: { x: number; y: number; circle: number };
  measured: { x: number; y: number; diagonal1: number; diagonal2: number; circleX: number; circleY: number; kerf?: number };
  circleKind: 'hole' | 'disc';
  stepsPerMm?: { x?: number; y?: number };
  note?: string;
}

export function useCreateTestCut(machineId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: TestCutInput) => api.post<TestCut>(`/machines/${machineId}/test-cuts`, input),
    onSuccess: () => qc.invalidateQueries({ queryKey: frameKeys.testCuts(machineId) }),
  });
}

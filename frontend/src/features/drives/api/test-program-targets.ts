import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { LengthUnit } from '../../../lib/units';
import { driveKeys } from '../types';

/** GET /api/axes/:id/test-targets: the targets the repeat-and-reverse program reads at. */
export interface TestTargets {
  lengthUnit: LengthUnit;
  targets: number[];
  targetsMm: number[];
  overrun: number;
  overrunMm: number;
  runs: number;
  reason: string | null;
  source: string;
}

export const testTargetsQueryOptions = (axisId: string) =>
  queryOptions({ queryKey: [...driveKeys.axis(axisId), 'test-targets'] as const, queryFn: () => api.get<TestTargets>(`/axes/${axisId}/test-targets`) });

export const useTestTargets = (axisId: string) => useQuery(testTargetsQueryOptions(axisId));

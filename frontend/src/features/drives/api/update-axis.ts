import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { MACHINE_STATE_KEYS } from '../../../lib/machine-state-keys';
import { driveKeys, type Axis } from '../types';
import type { AxisInput } from './create-axis';

export function useUpdateAxis(axisId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (patch: Partial<AxisInput>) => api.patch<Axis>(`/axes/${axisId}`, patch),
    onSuccess: (axis) => {
      qc.setQueryData(driveKeys.axis(axisId), axis);
      return Promise.all([
        qc.invalidateQueries({ queryKey: driveKeys.all }),
        ...MACHINE_STATE_KEYS.map((queryKey) => qc.invalidateQueries({ queryKey })),
      ]);
    },
  });
}

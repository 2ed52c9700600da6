import { useMutation, useQueryClient } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { targetSetKeys, type TargetSet } from '../types';

/** A new set made from an existing one: every target with its value, unit, source and reference. */
export function useCreateTargetSet() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ from, name, description }: { from: TargetSet; name: string; description: string }) => {
      const targets = Object.fromEntries(
        Object.entries(from.targets).map(([key, t]) => [
          key,
          {
            value: t.value,
            unit: t.unit,
            ...(t.source ? { source: t.source } : {}),
            ...(t.reference ? { reference: t.reference } : {}),
          },
        ]),
      );
      return answer(client.POST('/api/target-sets', { body: { name, description, targets } }));
    },
    onSuccess: () => qc.invalidateQueries({ queryKey: targetSetKeys.all }),
  });
}

import { useMutation, useQueryClient, type QueryKey } from '@tanstack/react-query';
import { client } from '../api-client';
import { MACHINE_STATE_KEYS } from '../machine-state-keys';
import { lastParam, type CheckItemPath } from './check-paths';

/**
 * Removes a check recorded in error (the server refuses once an approval stands on it): `mutate`
 * takes the record's id, the path's last parameter; `{id}` is the parent. Refreshes `refresh`
 * and the machine's state and board.
 */
export function useDeleteCheck(path: CheckItemPath, parentId: string, refresh: QueryKey[]) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (recordId: string) =>
      void (await client.DELETE(path, {
        // Every CheckItemPath names its parent `id` and the record by its last parameter.
        params: { path: { id: parentId, [lastParam(path)]: recordId } },
      } as never)),
    onSuccess: () =>
      Promise.all([...refresh, ...MACHINE_STATE_KEYS].map((queryKey) => qc.invalidateQueries({ queryKey }))),
  });
}

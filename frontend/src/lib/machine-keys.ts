/**
 * The machines' query keys. Shared because other features refresh a machine's header, list and
 * history after their own writes (an approval changes the machine's state).
 */
export const machineKeys = {
  all: ['machines'] as const,
  list: () => [...machineKeys.all, 'list'] as const,
  detail: (id: string) => [...machineKeys.all, 'detail', id] as const,
  history: (id: string) => [...machineKeys.all, 'history', id] as const,
};

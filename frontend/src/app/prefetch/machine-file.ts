import type { QueryClient } from '@tanstack/react-query';
import { machineQueryOptions } from '../../features/machines/api/get-machine';
import { readinessQueryOptions } from '../../features/approvals/api/get-readiness';

/**
 * What a machine file shows first, asked all at once: the machine (its name heads the page) and,
 * when the file opens on readiness, the board's data. Same query keys as the page's own
 * queries, so what is asked here is what the page reads, never asked twice.
 */
export function prefetchMachineFile(queryClient: QueryClient, machineId: string, tab: string | null) {
  void queryClient.prefetchQuery(machineQueryOptions(machineId));
  if (tab !== null && tab !== 'readiness') return;
  void queryClient.prefetchQuery(readinessQueryOptions(machineId));
}

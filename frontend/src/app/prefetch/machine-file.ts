import type { QueryClient } from '@tanstack/react-query';
import { machineQueryOptions } from '../../features/machines/api/get-machine';
import { readinessQueryOptions } from '../../features/approvals/api/get-readiness';

type ReadinessBoardModule = typeof import('../../features/approvals/components/readiness-board');
let readinessBoard: ReadinessBoardModule['ReadinessBoard'] | undefined;

/** The readiness board's code: the tab the machine file opens on. */
export const loadReadinessBoard = () =>
  import('../../features/approvals/components/readiness-board').then((m) => {
    readinessBoard = m.ReadinessBoard;
    return m;
  });

/**
 * The board once its code is here, so a file opened with it loaded draws it at once instead of
 * through a lazy component (which always waits a turn, then is revealed on React's next beat).
 */
export const loadedReadinessBoard = () => readinessBoard;

/**
 * What a machine file shows first, asked all at once: the machine (its name heads the page) and,
 * when the file opens on readiness, the board's data and code. Same query keys as the page's own
 * queries, so what is asked here is what the page reads, never asked twice.
 */
export function prefetchMachineFile(queryClient: QueryClient, machineId: string, tab: string | null) {
  void queryClient.prefetchQuery(machineQueryOptions(machineId));
  if (tab !== null && tab !== 'readiness') return;
  void queryClient.prefetchQuery(readinessQueryOptions(machineId));
  void loadReadinessBoard();
}

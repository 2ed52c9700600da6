import { useDeferredValue, useState } from 'react';
import { useMachineHistory } from '../api/get-machine-history';
import { LoadingState } from '../../../components/states/loading-state';
import { ErrorState } from '../../../components/states/error-state';
import { EmptyState } from '../../../components/states/empty-state';
import { HistoryFilterBar } from '../../../components/history/history-filter-bar';
import { HistoryEntryList } from '../../../components/history/history-entry-list';
import { MACHINE_HISTORY_KINDS } from '../../../components/history/history-kinds';
import { NO_FILTERS, type HistoryFilters } from '../../../components/history/history-types';

/** The machine's audit history: who changed what, when, with every value before and after; a page at a time. */
export function MachineHistory({ machineId }: { machineId: string }) {
  const [filters, setFilters] = useState<HistoryFilters>(NO_FILTERS);
  const deferred = useDeferredValue(filters);
  const history = useMachineHistory(machineId, deferred);
  const entries = history.data?.pages.flatMap((p) => p.entries) ?? [];
  return (
    <>
      <HistoryFilterBar value={filters} onChange={setFilters} kinds={MACHINE_HISTORY_KINDS} />
      {history.isPending ? (
        <LoadingState label="Loading history…" />
      ) : history.isError ? (
        <ErrorState error={history.error} onRetry={() => history.refetch()} />
      ) : !entries.length ? (
        <EmptyState
          title={
            JSON.stringify(deferred) === JSON.stringify(NO_FILTERS) ? 'No changes yet' : 'Nothing matches these filters'
          }
        />
      ) : (
        <HistoryEntryList
          entries={entries}
          hasMore={history.hasNextPage}
          loadingMore={history.isFetchingNextPage}
          onLoadMore={() => history.fetchNextPage()}
        />
      )}
    </>
  );
}

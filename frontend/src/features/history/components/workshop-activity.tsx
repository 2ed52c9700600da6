import { useDeferredValue, useState } from 'react';
import { useWorkshopHistory } from '../api/get-workshop-history';
import { LoadingState } from '../../../components/states/loading-state';
import { ErrorState } from '../../../components/states/error-state';
import { EmptyState } from '../../../components/states/empty-state';
import { HistoryFilterBar } from '../../../components/history/history-filter-bar';
import { HistoryEntryList } from '../../../components/history/history-entry-list';
import { WORKSHOP_HISTORY_KINDS } from '../../../components/history/history-kinds';
import { NO_FILTERS, type HistoryFilters } from '../../../components/history/history-types';

/** Everything that happened in the workshop: people, roles, sign-ins, target sets and every machine. */
export function WorkshopActivity() {
  const [filters, setFilters] = useState<HistoryFilters>(NO_FILTERS);
  const deferred = useDeferredValue(filters);
  const history = useWorkshopHistory(deferred);
  const entries = history.data?.pages.flatMap((p) => p.entries) ?? [];
  return (
    <>
      <HistoryFilterBar value={filters} onChange={setFilters} kinds={WORKSHOP_HISTORY_KINDS} />
      {history.isPending ? (
        <LoadingState label="Loading activity…" />
      ) : history.isError ? (
        <ErrorState error={history.error} onRetry={() => history.refetch()} />
      ) : !entries.length ? (
        <EmptyState
          title={
            JSON.stringify(deferred) === JSON.stringify(NO_FILTERS)
              ? 'No activity yet'
              : 'Nothing matches these filters'
          }
        />
      ) : (
        <HistoryEntryList
          entries={entries}
          showMachine
          hasMore={history.hasNextPage}
          loadingMore={history.isFetchingNextPage}
          onLoadMore={() => history.fetchNextPage()}
        />
      )}
    </>
  );
}

import { infiniteQueryOptions, useInfiniteQuery, type QueryKey } from '@tanstack/react-query';
import { answer, client } from '../api-client';
import type { CheckList, CheckListPath, CheckRecordOf } from './check-paths';

/** Records a list asks for at a time (the server's default page size). */
export const CHECK_PAGE_SIZE = 50;

/**
 * A parent's check records, newest first, a page at a time: the cursor of the next page is the id
 * of the last record of this one, and a page shorter than `pageSize` is the last.
 */
export function checkRecordsQueryOptions<P extends CheckListPath>(
  path: P,
  parentId: string,
  queryKey: QueryKey,
  pageSize = CHECK_PAGE_SIZE,
) {
  return infiniteQueryOptions({
    queryKey,
    queryFn: ({ pageParam }) =>
      answer<CheckList<P>>(
        // Every CheckListPath takes these parameters; the client cannot see it through the union.
        client.GET(
          path as CheckListPath,
          {
            params: { path: { id: parentId }, query: { limit: pageSize, cursor: pageParam || undefined } },
          } as never,
        ),
      ),
    initialPageParam: '',
    getNextPageParam: (last: { id: string }[]) => (last.length === pageSize ? last[last.length - 1].id : undefined),
    select: (data) => data.pages.flat() as CheckRecordOf<P>[],
  });
}

export const useCheckRecords = <P extends CheckListPath>(
  path: P,
  parentId: string,
  queryKey: QueryKey,
  pageSize = CHECK_PAGE_SIZE,
) => useInfiniteQuery(checkRecordsQueryOptions(path, parentId, queryKey, pageSize));

import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { calculatorKeys } from '../types';

/** A result together with the request it answers, so charts never mix one input with another's result. */
export interface Calculated<Req, Res> {
  request: Req;
  result: Res;
}

/**
 * Calculations are POSTs that change nothing, so they are read as queries keyed by their body:
 * the last result stays on screen while the next is computed, and equal inputs are not re-sent.
 */
export function calculationQueryOptions<Req, Res>(route: string, body: Req | null) {
  return queryOptions({
    queryKey: calculatorKeys.run(route, body),
    queryFn: async (): Promise<Calculated<Req, Res>> => ({
      request: body as Req,
      result: await api.post<Res>(`/calc/${route}`, body),
    }),
    enabled: body !== null,
    placeholderData: keepPreviousData,
    staleTime: Infinity,
    retry: false,
  });
}

export const useCalculation = <Req, Res>(route: string, body: Req | null) =>
  useQuery(calculationQueryOptions<Req, Res>(route, body));

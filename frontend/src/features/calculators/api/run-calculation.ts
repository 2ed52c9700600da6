import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { calculatorKeys } from '../types';

/** A result together with the request it answers, so charts never mix one input with another's result. */
export interface Calculated<Req, Res> {
  request: Req;
  result: Res;
}

/**
 * Calculations are POSTs that change nothing, so they are read as queries keyed by their body:
 * the last result stays on screen while the next is computed, and equal inputs are not re-sent.
 * `send` is the calculator's own typed call (`client.POST('/api/calc/…', { body })`).
 */
export function calculationQueryOptions<Req, Res>(
  calculator: string,
  body: Req | null,
  send: (body: Req) => Promise<Res>,
) {
  return queryOptions({
    queryKey: calculatorKeys.run(calculator, body),
    queryFn: async (): Promise<Calculated<Req, Res>> => ({ request: body!, result: await send(body!) }),
    enabled: body !== null,
    placeholderData: keepPreviousData,
    staleTime: Infinity,
    retry: false,
  });
}

export const useCalculation = <Req, Res>(calculator: string, body: Req | null, send: (body: Req) => Promise<Res>) =>
  useQuery(calculationQueryOptions(calculator, body, send));

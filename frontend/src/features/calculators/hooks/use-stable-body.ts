import { useMemo } from 'react';
import { useDebouncedValue } from './use-debounced-value';

/**
 * Debounces a request body built from form state. The body is compared by its JSON, so an
 * unchanged form does not produce a new request after re-renders.
 */
export function useStableBody<T>(body: T | null, delayMs = 300): T | null {
  const json = useDebouncedValue(body === null ? null : JSON.stringify(body), delayMs);
  return useMemo(() => (json === null ? null : (JSON.parse(json) as T)), [json]);
}

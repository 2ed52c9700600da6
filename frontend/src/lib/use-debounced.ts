import { useEffect, useMemo, useState } from 'react';

/**
 * The value once it has stopped changing for `ms`; keeps the live preview from sending every
 * keystroke. Compared by its JSON, so a value rebuilt with the same content on a re-render does
 * not restart the wait nor hand back a new object (which would re-render the form for nothing).
 */
export function useDebounced<T>(value: T, ms = 150): T {
  const json = JSON.stringify(value ?? null);
  const [settled, setSettled] = useState(json);
  useEffect(() => {
    if (json === settled) return;
    const t = setTimeout(() => setSettled(json), ms);
    return () => clearTimeout(t);
  }, [json, settled, ms]);
  return useMemo(() => JSON.parse(settled) as T, [settled]);
}

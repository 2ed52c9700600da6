import { useEffect, useMemo, useState } from 'react';

/** The value once it has stopped changing for `ms` (compared by JSON), so the preview is not asked on every key. */
export function useSettled<T>(value: T, ms = 250): T {
  const json = JSON.stringify(value ?? null);
  const [settled, setSettled] = useState(json);
  useEffect(() => {
    if (json === settled) return;
    const t = setTimeout(() => setSettled(json), ms);
    return () => clearTimeout(t);
  }, [json, settled, ms]);
  return useMemo(() => JSON.parse(settled) as T, [settled]);
}

import { useEffect, useState } from 'react';

/** The value once it has stopped changing for `delayMs` (compared by JSON, so new objects with the same content do not restart the wait). */
export function useDebounced<T>(value: T, delayMs = 300): T {
  const [settled, setSettled] = useState(value);
  const key = JSON.stringify(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(JSON.parse(key) as T), delayMs);
    return () => clearTimeout(timer);
  }, [key, delayMs]);
  return settled;
}

import { useEffect, useState } from 'react';

/** The value once it has stopped changing for `ms`; keeps the live preview from sending every keystroke. */
export function useDebounced<T>(value: T, ms = 150): T {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    const t = setTimeout(() => setSettled(value), ms);
    return () => clearTimeout(t);
  }, [value, ms]);
  return settled;
}

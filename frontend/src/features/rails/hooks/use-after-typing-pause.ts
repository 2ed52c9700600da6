import { startTransition, useEffect, useState } from 'react';
import type { SweepDraftStore } from './use-sweep-draft';

/** How long the readings must be left alone before a new fit is drawn. */
export const TYPING_PAUSE_MS = 1000;

/**
 * `value`, but changed only once the draft has been left alone for TYPING_PAUSE_MS. Drawing a fit
 * (the chart and every row's residual) is the costliest thing the form does; on a slow tablet,
 * drawn while someone is still typing, it holds up their next keys. So a fit that arrives while
 * readings are being typed waits for the pause and is drawn then.
 */
export function useAfterTypingPause<T>(value: T, store: SweepDraftStore, pauseMs = TYPING_PAUSE_MS): T {
  const [shown, setShown] = useState(value);
  const [lastEdit] = useState(() => ({ at: -Infinity }));
  useEffect(
    () =>
      store.subscribe(() => {
        lastEdit.at = performance.now();
      }),
    [store, lastEdit],
  );
  useEffect(() => {
    if (Object.is(value, shown)) return;
    let timer: ReturnType<typeof setTimeout> | undefined;
    const showWhenQuiet = () => {
      const wait = lastEdit.at + pauseMs - performance.now();
      if (wait > 0) timer = setTimeout(showWhenQuiet, wait);
      else startTransition(() => setShown(() => value));
    };
    timer = setTimeout(showWhenQuiet, 0);
    return () => clearTimeout(timer);
  }, [value, shown, pauseMs, lastEdit]);
  return shown;
}

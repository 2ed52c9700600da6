import { startTransition, useEffect, useState } from 'react';
import type { PreviewBody } from '../api/preview-straightness';
import { readyStations } from '../utils/stations';
import type { SweepDraft, SweepDraftStore } from './use-sweep-draft';

/** How long typing must pause before the readings are fitted. */
export const SETTLE_MS = 400;

/** What the fit is asked for: three or more readings and nothing to fix, else nothing. */
export function previewBodyOf(d: SweepDraft): PreviewBody | null {
  const ready = readyStations(d.stations);
  if (ready.stations.length < 3 || ready.problems.size > 0) return null;
  return {
    positions: ready.stations.map((s) => s.position),
    readings: ready.stations.map((s) => s.reading),
    readingUnit: d.unit,
    lengthUnit: d.lengthUnit,
  };
}

/**
 * The readings to fit once typing has paused for SETTLE_MS, watched outside React rendering: the
 * form re-renders when the fitted readings change, not on every keystroke. A change that leaves
 * them as they were (a position typed, a blank added) changes nothing.
 */
export function useSettledBody(store: SweepDraftStore): PreviewBody | null {
  const [settled, setSettled] = useState(() => ({ body: previewBodyOf(store.getState()), json: '' }));
  useEffect(() => {
    let timer: ReturnType<typeof setTimeout> | undefined;
    let last = JSON.stringify(previewBodyOf(store.getState()));
    const settle = () => {
      const body = previewBodyOf(store.getState());
      const json = JSON.stringify(body);
      if (json === last) return;
      last = json;
      // At low priority: the fit it asks for must not hold up the next keystroke.
      startTransition(() => setSettled({ body, json }));
    };
    const unsubscribe = store.subscribe(() => {
      clearTimeout(timer);
      timer = setTimeout(settle, SETTLE_MS);
    });
    return () => {
      clearTimeout(timer);
      unsubscribe();
    };
  }, [store]);
  return settled.body;
}

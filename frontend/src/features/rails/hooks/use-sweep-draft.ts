import { useEffect, useState } from 'react';
import { createStore, useStore, type StoreApi } from 'zustand';
import { readDraft, saveDraftSoon } from '../../../lib/draft-storage';
import type { LengthUnit } from '../../../lib/units';
import type { SweepFace, SweepPhase } from '../types';
import { clientId } from '../utils/client-id';

export interface StationDraft {
  position: string;
  reading: string;
}

export interface SweepDraft {
  id: string;
  /** Unit of the readings and the resolution (the reading unit). */
  unit: LengthUnit;
  /** Unit of the station positions. */
  lengthUnit: LengthUnit;
  face: SweepFace;
  stations: StationDraft[];
  instrument: string;
  resolution: string;
  temperatureC: string;
  phase: SweepPhase;
  takenBy: string;
  boltSize: string;
  torqueNm: string;
  datum: string;
  notes: string;
}

export const newDraft = (stations: StationDraft[], keep?: Partial<SweepDraft>): SweepDraft => ({
  id: clientId(),
  unit: 'thou',
  lengthUnit: 'mm',
  face: 'side',
  instrument: '',
  resolution: '',
  temperatureC: '',
  phase: 'as-found',
  takenBy: '',
  boltSize: '',
  torqueNm: '',
  datum: '',
  notes: '',
  ...keep,
  stations,
});

const key = (railId: string) => `railwright.sweep-draft.${railId}`;

/** The sweep being typed, outside React state: each part of the form subscribes to its own slice. */
export type SweepDraftStore = StoreApi<SweepDraft>;

/**
 * The sweep being typed, kept in the browser so a reload or a dropped tab loses no reading.
 * Saved a few times a second at most (lib/draft-storage.ts), and at once when the page is left.
 * A store rather than state of the form: a keystroke in one station re-renders that station's
 * row (and what counts the readings), not the whole form with its chart and selects.
 */
export function useSweepDraft(railId: string, initial: () => SweepDraft): SweepDraftStore {
  const [store] = useState(() =>
    createStore<SweepDraft>(() => {
      try {
        const saved = readDraft(key(railId));
        // A draft saved before positions had their own unit or the face was asked: those default.
        if (saved) return { ...initial(), ...(JSON.parse(saved) as Partial<SweepDraft>) } as SweepDraft;
      } catch {
        // A broken saved draft is dropped; the new one starts clean.
      }
      return initial();
    }),
  );
  useEffect(() => store.subscribe((draft) => saveDraftSoon(key(railId), JSON.stringify(draft))), [railId, store]);
  return store;
}

/** One slice of the draft; the component re-renders only when that slice changes (compared with Object.is). */
export const useDraft = <S>(store: SweepDraftStore, select: (d: SweepDraft) => S): S => useStore(store, select);

import { fromMm, type LengthUnit } from '../../../lib/units';
import type { StationDraft } from '../hooks/use-sweep-draft';

/** A station at each hole, its position in `unit` (holes are kept in mm). */
export const stationsAtHoles = (holes: { position: number }[], unit: LengthUnit = 'mm'): StationDraft[] =>
  holes.map((h) => ({ position: String(Number(fromMm(h.position, unit).toPrecision(10))), reading: '' }));

/** Stations every `step` from 0 to `length`, both in the same unit. */
export function stationsByStep(length: number, step: number): StationDraft[] {
  if (!(step > 0)) return [];
  const count = Math.min(Math.floor(length / step + 1e-9) + 1, 2000);
  return Array.from({ length: count }, (_, i) => ({
    position: String(Math.round(i * step * 10000) / 10000),
    reading: '',
  }));
}

const asNumber = (s: string) => {
  const t = s.trim().replace(',', '.');
  return t === '' || !/^[+-]?(\d+\.?\d*|\.\d+)$/.test(t) ? null : Number(t);
};

export interface ReadyStations {
  stations: { position: number; reading: number }[];
  /** Row index → what is wrong with it. */
  problems: Map<number, string>;
  blank: number;
}

function countReady(rows: StationDraft[]): ReadyStations {
  const problems = new Map<number, string>();
  const seen = new Map<number, number>();
  const stations: { position: number; reading: number }[] = [];
  let blank = 0;
  rows.forEach((r, i) => {
    const position = asNumber(r.position);
    if (r.reading.trim() === '') {
      blank++;
      return;
    }
    const reading = asNumber(r.reading);
    if (position === null) problems.set(i, 'Position is not a number');
    else if (reading === null) problems.set(i, 'Reading is not a number');
    else if (seen.has(position)) problems.set(i, `Position repeats station ${seen.get(position)! + 1}`);
    else {
      seen.set(position, i);
      stations.push({ position, reading });
    }
  });
  return { stations, problems, blank };
}

const readyCache = new WeakMap<StationDraft[], ReadyStations>();

/**
 * The stations that can be sent: both numbers, no repeated position; blank readings are left out.
 * Worked out once per list of rows: the fields, the count and the fit all ask after each
 * keystroke, and a draft's stations are a new array whenever any of them changes.
 */
export function readyStations(rows: StationDraft[]): ReadyStations {
  let ready = readyCache.get(rows);
  if (!ready) {
    ready = countReady(rows);
    readyCache.set(rows, ready);
  }
  return ready;
}

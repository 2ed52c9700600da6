import type { StationDraft } from '../hooks/use-sweep-draft';

export const stationsAtHoles = (holes: { position: number }[]): StationDraft[] => holes.map((h) => ({ position: String(h.position), reading: '' }));

export function stationsByStep(lengthMm: number, stepMm: number): StationDraft[] {
  if (!(stepMm > 0)) return [];
  const count = Math.min(Math.floor(lengthMm / stepMm + 1e-9) + 1, 2000);
  return Array.from({ length: count }, (_, i) => ({ position: String(Math.round(i * stepMm * 1000) / 1000), reading: '' }));
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

/** The stations that can be sent: both numbers, no repeated position; blank readings are left out. */
export function readyStations(rows: StationDraft[]): ReadyStations {
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

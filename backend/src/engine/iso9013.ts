/**
 * ISO 9013 (thermal cutting: classification, tolerances) gives limit deviations for the nominal
 * dimensions of cut parts in two tolerance classes, by nominal size band and plate thickness band.
 * Plasma usually reaches class 2. Only class 2 is held here.
 *
 * Source of the values: the cell for 35–125 mm parts in plate over 3.15 up to 6.3 mm, ±0.9 mm, is
 * the one TRADE.md states ("about ±0.9 mm on 35–125 mm parts in 3–6 mm plate"). Every other cell,
 * and the band limits themselves (sizes ≥ lower and < upper limit; thickness over lower up to and
 * including upper), are FROM MEMORY of the standard's class 2 table and not confirmed against a copy
 * of it: the owner's target scales them (see partToleranceFor), and the source text says so.
 */

export const ISO9013_SIZE_BANDS_MM: readonly [number, number][] = [
  [0, 3],
  [3, 10],
  [10, 35],
  [35, 125],
  [125, 315],
  [315, 1000],
  [1000, 2000],
  [2000, 4000],
];

export const ISO9013_THICKNESS_BANDS_MM: readonly [number, number][] = [
  [0, 1],
  [1, 3.15],
  [3.15, 6.3],
  [6.3, 10],
  [10, 50],
  [50, 100],
  [100, 150],
];

// Class 2 limit deviations ±mm; rows by thickness band, columns by size band; null where the
// standard gives none (parts smaller than the plate is thick). From memory except [2][3].
const CLASS_2: readonly (readonly (number | null)[])[] = [
  [0.1, 0.3, 0.4, 0.5, 0.7, 0.8, 0.9, 0.9],
  [0.2, 0.4, 0.5, 0.7, 0.8, 0.9, 1.0, 1.1],
  [0.5, 0.7, 0.8, 0.9, 1.1, 1.2, 1.3, 1.3],
  [null, 1.0, 1.1, 1.3, 1.4, 1.5, 1.6, 1.7],
  [null, 1.8, 1.8, 1.8, 1.9, 2.3, 3.0, 4.2],
  [null, null, 2.5, 2.5, 2.6, 3.0, 3.7, 4.4],
  [null, null, 3.2, 3.3, 3.4, 3.7, 4.4, 5.1],
];

/** The cell TRADE.md states: class 2, 35–125 mm parts, plate over 3.15 up to 6.3 mm. */
export const ISO9013_REFERENCE = { sizeBand: 3, thicknessBand: 2, toleranceMm: 0.9 } as const;

export interface Iso9013Band {
  /** ± limit deviation of class 2 for this size and thickness, mm. */
  toleranceMm: number;
  sizeBandMm: [number, number];
  thicknessBandMm: [number, number];
  /** Why the band used is not the part's own (outside the table), or null when it is. */
  outside: string | null;
}

const fmt = (v: number) => String(Number(v.toFixed(3)));

export function iso9013Class2(nominalMm: number, plateThicknessMm: number): Iso9013Band {
  const reasons: string[] = [];
  let s = ISO9013_SIZE_BANDS_MM.findIndex(([lo, hi]) => nominalMm >= lo && nominalMm < hi);
  if (s < 0) {
    s = ISO9013_SIZE_BANDS_MM.length - 1;
    reasons.push(
      `a ${fmt(nominalMm)} mm size is beyond the table's largest band (${ISO9013_SIZE_BANDS_MM[s][0]}–${ISO9013_SIZE_BANDS_MM[s][1]} mm), whose value is used`,
    );
  }
  let t = ISO9013_THICKNESS_BANDS_MM.findIndex(([lo, hi]) => plateThicknessMm > lo && plateThicknessMm <= hi);
  if (t < 0) {
    t = ISO9013_THICKNESS_BANDS_MM.length - 1;
    reasons.push(
      `${fmt(plateThicknessMm)} mm plate is beyond the table's thickest band (${ISO9013_THICKNESS_BANDS_MM[t][0]}–${ISO9013_THICKNESS_BANDS_MM[t][1]} mm), whose value is used`,
    );
  }
  let value = CLASS_2[t][s];
  if (value === null) {
    // The standard gives no value for parts this small in plate this thick: the nearest larger size band.
    const next = CLASS_2[t].findIndex((v, i) => i > s && v !== null);
    reasons.push(
      `the table gives no value for ${ISO9013_SIZE_BANDS_MM[s][0]}–${ISO9013_SIZE_BANDS_MM[s][1]} mm parts in ${ISO9013_THICKNESS_BANDS_MM[t][0]}–${ISO9013_THICKNESS_BANDS_MM[t][1]} mm plate; the ${ISO9013_SIZE_BANDS_MM[next][0]}–${ISO9013_SIZE_BANDS_MM[next][1]} mm band is used`,
    );
    s = next;
    value = CLASS_2[t][s]!;
  }
  return {
    toleranceMm: value,
    sizeBandMm: [...ISO9013_SIZE_BANDS_MM[s]] as [number, number],
    thicknessBandMm: [...ISO9013_THICKNESS_BANDS_MM[t]] as [number, number],
    outside: reasons.length ? reasons.join('; ') : null,
  };
}

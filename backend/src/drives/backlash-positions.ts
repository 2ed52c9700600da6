import { toMm, type LengthUnit } from '../engine/units.js';

/**
 * Where a backlash check must read: near both ends of the travel and near its middle (TRADE.md,
 * common practice). "Near" is the outer fifth at each end and the middle fifth, so a check spread
 * anywhere else does not pass for one taken where play and wear differ most.
 */
export const ZONES = [
  { name: 'near the start', from: 0, to: 0.2 },
  { name: 'near the middle', from: 0.4, to: 0.6 },
  { name: 'near the end', from: 0.8, to: 1 },
] as const;

const fmt = (v: number) => String(Math.round(v * 1000) / 1000);

/** The problems with the positions of a check (field named in each), given the axis's measured travel in mm. */
export function positionProblems(positions: number[], lengthUnit: LengthUnit, travelMm: number | null): string[] {
  const problems: string[] = [];
  const mm = positions.map((p) => toMm(p, lengthUnit));
  const inUnit = (vMm: number) => `${fmt(lengthUnit === 'mm' ? vMm : vMm / toMm(1, lengthUnit))} ${lengthUnit}`;
  mm.forEach((p, i) => {
    if (p < 0)
      problems.push(
        `positions[${i}].position is ${positions[i]} ${lengthUnit}, below 0: positions are measured from the axis's work zero`,
      );
    else if (travelMm !== null && p > travelMm)
      problems.push(
        `positions[${i}].position is ${positions[i]} ${lengthUnit}, beyond the axis's measured travel of ${inUnit(travelMm)}`,
      );
  });
  mm.forEach((p, i) => {
    const j = mm.findIndex((q) => q === p);
    if (j < i)
      problems.push(
        `positions[${i}].position repeats positions[${j}].position (${positions[i]} ${lengthUnit}): put every reading of one position in one entry`,
      );
  });
  if (problems.length || travelMm === null || travelMm <= 0) return problems;
  for (const zone of ZONES) {
    const from = zone.from * travelMm;
    const to = zone.to * travelMm;
    if (!mm.some((p) => p >= from && p <= to)) {
      problems.push(
        `positions is missing a position ${zone.name} of the travel (between ${inUnit(from)} and ${inUnit(to)} of ${inUnit(travelMm)}): read at both ends and the middle`,
      );
    }
  }
  return problems;
}

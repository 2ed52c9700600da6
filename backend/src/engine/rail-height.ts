import { EngineInputError } from './engine-input-error.js';
import { requireFiniteResult, requireNumberArray, requireSameLength } from './validate.js';

/**
 * Height difference between two partner rails read on their top faces against one common datum
 * at the same stations (all mm): the worst station, i.e. the largest |B − A|. Two sweeps each
 * zeroed on their own rail cannot give a height; only readings against one datum can.
 */
export interface HeightDifferenceResult {
  /** Largest |B − A| over the stations, mm. */
  worstMm: number;
  /** Signed B − A at that station, mm (positive: B stands higher). */
  worstSignedMm: number;
  atMm: number;
  differencesMm: number[];
}

export function heightDifference(
  positionsMm: readonly number[],
  railAMm: readonly number[],
  railBMm: readonly number[],
): HeightDifferenceResult {
  const x = requireNumberArray('positions', positionsMm, 1);
  const a = requireNumberArray('railA', railAMm, 1);
  const b = requireNumberArray('railB', railBMm, 1);
  requireSameLength('positions', x, 'railA', a);
  requireSameLength('positions', x, 'railB', b);
  const differences = a.map((v, i) => b[i] - v);
  let worst = 0;
  for (let i = 1; i < differences.length; i++) if (Math.abs(differences[i]) > Math.abs(differences[worst])) worst = i;
  return requireFiniteResult('railA and railB', {
    worstMm: Math.abs(differences[worst]),
    worstSignedMm: differences[worst],
    atMm: x[worst],
    differencesMm: differences,
  });
}

/**
 * Permissible height difference for rails `spacingMm` apart: S = a × K, with K in µm per mm of
 * spacing (one maker's catalogue gives about 130 µm at 500 mm for light preload, K ≈ 0.26).
 * Returns S in mm.
 */
export function permissibleHeightDifferenceMm(spacingMm: number, kUmPerMm: number): number {
  if (!(Number.isFinite(spacingMm) && spacingMm > 0))
    throw new EngineInputError('spacing must be a positive length', 'spacing');
  if (!(Number.isFinite(kUmPerMm) && kUmPerMm > 0))
    throw new EngineInputError('K must be a positive number of µm per mm of spacing', 'K');
  return (spacingMm * kUmPerMm) / 1000;
}

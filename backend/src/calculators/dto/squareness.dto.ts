import { FiniteNumber, OptionalFiniteNumber } from './validators.js';
import { UnitFamiliesDto } from './unit-families.dto.js';

/** Sides, diagonals and gantry span in `lengthUnit`. */
export class SquarenessDto extends UnitFamiliesDto {
  /** Side along X, in lengthUnit. */
  @FiniteNumber('sideX')
  sideX: number;

  /** Side along Y, in lengthUnit. */
  @FiniteNumber('sideY')
  sideY: number;

  /** Diagonal from the X0 Y0 corner to the far corner, in lengthUnit. */
  @FiniteNumber('diagonal1')
  diagonal1: number;

  /** The other diagonal, in lengthUnit. */
  @FiniteNumber('diagonal2')
  diagonal2: number;

  /** Distance between the gantry's two bearing rails, in lengthUnit. */
  @OptionalFiniteNumber('gantrySpan')
  gantrySpan?: number;
}

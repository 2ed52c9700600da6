import { FiniteNumber, OptionalFiniteNumber } from './validators.js';
import { UnitFamiliesDto } from './unit-families.dto.js';

/** Sides, diagonals and gantry span in `lengthUnit`. */
export class SquarenessDto extends UnitFamiliesDto {
  @FiniteNumber('sideX')
  sideX: number;

  @FiniteNumber('sideY')
  sideY: number;

  @FiniteNumber('diagonal1')
  diagonal1: number;

  @FiniteNumber('diagonal2')
  diagonal2: number;

  @OptionalFiniteNumber('gantrySpan')
  gantrySpan?: number;
}

import { FiniteNumber, OptionalFiniteNumber } from './validators.js';

/** All lengths in mm. */
export class SquarenessDto {
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

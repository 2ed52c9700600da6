import type { LengthUnit } from '../../engine/units.js';
import { LengthUnitField } from '../../common/unit-fields.js';
import { NoSingleUnit, OptionalNote, OptionalPositive, PositiveLength } from './fields.js';
import { Optional } from '../../common/optional.js';
import { ApiHideProperty } from '@nestjs/swagger';

/**
 * A rectangle the machine marked or cut (or the frame): its two sides, both diagonals and the
 * gantry span, all in `lengthUnit` (mm when absent). Diagonal 1 runs from the X0 Y0 corner to the far
 * corner, diagonal 2 from the X-far Y0 corner to the X0 Y-far corner.
 */
export class CreateDiagonalCheckDto {
  @PositiveLength('sideX')
  sideX: number;

  @PositiveLength('sideY')
  sideY: number;

  @PositiveLength('diagonal1')
  diagonal1: number;

  @PositiveLength('diagonal2')
  diagonal2: number;

  @Optional()
  @PositiveLength('gantrySpan')
  gantrySpan?: number;

  /** Smallest step of the tape or rule the diagonals were read with, in lengthUnit. */
  @OptionalPositive('resolution')
  resolution?: number;

  @LengthUnitField()
  lengthUnit?: LengthUnit;

  @NoSingleUnit()
  @ApiHideProperty() // refused when sent, so not part of the described request
  unit?: unknown;

  @OptionalNote()
  note?: string;
}

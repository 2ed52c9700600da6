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
  /** Side along X, in lengthUnit. */
  @PositiveLength('sideX')
  sideX: number;

  /** Side along Y, in lengthUnit. */
  @PositiveLength('sideY')
  sideY: number;

  /** Diagonal from the X0 Y0 corner to the far corner, in lengthUnit. */
  @PositiveLength('diagonal1')
  diagonal1: number;

  /** Diagonal from the X-far Y0 corner to the X0 Y-far corner, in lengthUnit. */
  @PositiveLength('diagonal2')
  diagonal2: number;

  /** Distance between the gantry's two bearing rails, in lengthUnit. */
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

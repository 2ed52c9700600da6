import { Type } from 'class-transformer';
import { IsIn, IsNumber, IsObject, IsPositive, Max, Min, ValidateNested } from 'class-validator';
import type { CircleKind } from '../../database/schema/frame.js';
import type { LengthUnit } from '../../engine/units.js';
import { LengthUnitField } from '../../common/unit-fields.js';
import { NoSingleUnit, OptionalNote, OptionalPositive, PositiveLength } from './fields.js';
import { Optional } from '../../common/optional.js';
import { ApiHideProperty } from '@nestjs/swagger';

export class TestCutNominalDto {
  /** Side along X commanded, in lengthUnit. */
  @PositiveLength('nominal.x')
  x: number;

  /** Side along Y commanded, in lengthUnit. */
  @PositiveLength('nominal.y')
  y: number;

  /** Commanded diameter of the circle, in lengthUnit. */
  @PositiveLength('nominal.circle')
  circle: number;
}

export class TestCutMeasuredDto {
  /** Side along X measured, in lengthUnit. */
  @PositiveLength('measured.x')
  x: number;

  /** Side along Y measured, in lengthUnit. */
  @PositiveLength('measured.y')
  y: number;

  /** Diagonal from the X0 Y0 corner to the far corner, in lengthUnit. */
  @PositiveLength('measured.diagonal1')
  diagonal1: number;

  /** The other diagonal, in lengthUnit. */
  @PositiveLength('measured.diagonal2')
  diagonal2: number;

  /** Circle diameter measured along X, in lengthUnit. */
  @PositiveLength('measured.circleX')
  circleX: number;

  /** Circle diameter measured along Y, in lengthUnit. */
  @PositiveLength('measured.circleY')
  circleY: number;

  /** Width of cut the controller did not compensate for, in lengthUnit; leave out (or 0) when kerf compensation was on. */
  @Optional()
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'measured.kerf must be a number' })
  @Min(0, { message: 'measured.kerf must not be negative' })
  @Max(1_000_000, { message: 'measured.kerf is too large' })
  kerf?: number;
}

export class StepsPerMmDto {
  /** Steps per mm set for X. */
  @Optional()
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'stepsPerMm.x must be a number' })
  @IsPositive({ message: 'stepsPerMm.x must be greater than zero' })
  x?: number;

  /** Steps per mm set for Y. */
  @Optional()
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'stepsPerMm.y must be a number' })
  @IsPositive({ message: 'stepsPerMm.y must be greater than zero' })
  y?: number;
}

/** Commanded and measured sizes of the test cut, lengths in `lengthUnit` (mm when absent). */
export class CreateTestCutDto {
  /** Unit of every size, diagonal, diameter, kerf, plate thickness and resolution (mm when absent). */
  @LengthUnitField()
  lengthUnit?: LengthUnit;

  @NoSingleUnit()
  @ApiHideProperty() // refused when sent, so not part of the described request
  unit?: unknown;

  /** Thickness of the plate cut, in lengthUnit: with the part size it picks the ISO 9013 band. */
  @OptionalPositive('plateThickness')
  plateThickness?: number;

  /** Smallest step of the caliper or rule the sizes were read with, in lengthUnit. */
  @OptionalPositive('resolution')
  resolution?: number;

  @IsObject({ message: 'nominal must be {x, y, circle}' })
  @ValidateNested()
  @Type(() => TestCutNominalDto)
  nominal: TestCutNominalDto;

  @IsObject({ message: 'measured must be {x, y, diagonal1, diagonal2, circleX, circleY, kerf?}' })
  @ValidateNested()
  @Type(() => TestCutMeasuredDto)
  measured: TestCutMeasuredDto;

  /** Whether the circle is a hole in the square (default) or a disc cut on its own. */
  @Optional()
  @IsIn(['hole', 'disc'], { message: 'circleKind must be hole or disc' })
  circleKind?: CircleKind;

  /** The controller's steps per mm when the cut was made, for the suggested new values. */
  @Optional()
  @IsObject({ message: 'stepsPerMm must be {x, y}' })
  @ValidateNested()
  @Type(() => StepsPerMmDto)
  stepsPerMm?: StepsPerMmDto;

  @OptionalNote()
  note?: string;
}

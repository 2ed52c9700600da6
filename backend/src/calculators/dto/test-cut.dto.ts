import { Type } from 'class-transformer';
import { IsObject, ValidateNested } from 'class-validator';
import { FiniteNumber, OptionalFiniteNumber } from './validators.js';
import { UnitFamiliesDto } from './unit-families.dto.js';
import { Optional } from '../../common/optional.js';

export class CutSizeDto {
  /** Size commanded, in lengthUnit. */
  @FiniteNumber('commanded')
  commanded: number;

  /** Size measured, in lengthUnit. */
  @FiniteNumber('measured')
  measured: number;
}

export class CutCircleDto {
  /** Diameter commanded, in lengthUnit. */
  @FiniteNumber('commandedDiameter')
  commandedDiameter: number;

  /** Diameter measured along X, in lengthUnit. */
  @FiniteNumber('measuredX')
  measuredX: number;

  /** Diameter measured along Y, in lengthUnit. */
  @FiniteNumber('measuredY')
  measuredY: number;
}

/** Outside sizes of a cut square (and optionally its diagonals and a circle), all in `lengthUnit`. */
export class TestCutDto extends UnitFamiliesDto {
  @IsObject({ message: 'x must be {commanded, measured}' })
  @ValidateNested()
  @Type(() => CutSizeDto)
  x: CutSizeDto;

  @IsObject({ message: 'y must be {commanded, measured}' })
  @ValidateNested()
  @Type(() => CutSizeDto)
  y: CutSizeDto;

  /** Steps per mm set for X when the cut was made. */
  @OptionalFiniteNumber('stepsPerMmX')
  stepsPerMmX?: number;

  /** Steps per mm set for Y when the cut was made. */
  @OptionalFiniteNumber('stepsPerMmY')
  stepsPerMmY?: number;

  /** Diagonal from the X0 Y0 corner to the far corner, in lengthUnit. */
  @OptionalFiniteNumber('diagonal1')
  diagonal1?: number;

  /** The other diagonal, in lengthUnit. */
  @OptionalFiniteNumber('diagonal2')
  diagonal2?: number;

  /** Distance between the gantry's two bearing rails, in lengthUnit. */
  @OptionalFiniteNumber('gantrySpan')
  gantrySpan?: number;

  @Optional()
  @IsObject({ message: 'circle must be {commandedDiameter, measuredX, measuredY}' })
  @ValidateNested()
  @Type(() => CutCircleDto)
  circle?: CutCircleDto;

  /** Largest difference of the circle's two diameters that passes, in lengthUnit. */
  @OptionalFiniteNumber('ovalityTolerance')
  ovalityTolerance?: number;
}

import { Type } from 'class-transformer';
import { IsObject, ValidateNested } from 'class-validator';
import { FiniteNumber, OptionalFiniteNumber } from './validators.js';
import { UnitFamiliesDto } from './unit-families.dto.js';
import { Optional } from '../../common/optional.js';

export class CutSizeDto {
  @FiniteNumber('commanded')
  commanded: number;

  @FiniteNumber('measured')
  measured: number;
}

export class CutCircleDto {
  @FiniteNumber('commandedDiameter')
  commandedDiameter: number;

  @FiniteNumber('measuredX')
  measuredX: number;

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

  @OptionalFiniteNumber('stepsPerMmX')
  stepsPerMmX?: number;

  @OptionalFiniteNumber('stepsPerMmY')
  stepsPerMmY?: number;

  @OptionalFiniteNumber('diagonal1')
  diagonal1?: number;

  @OptionalFiniteNumber('diagonal2')
  diagonal2?: number;

  @OptionalFiniteNumber('gantrySpan')
  gantrySpan?: number;

  @Optional()
  @IsObject({ message: 'circle must be {commandedDiameter, measuredX, measuredY}' })
  @ValidateNested()
  @Type(() => CutCircleDto)
  circle?: CutCircleDto;

  @OptionalFiniteNumber('ovalityTolerance')
  ovalityTolerance?: number;
}

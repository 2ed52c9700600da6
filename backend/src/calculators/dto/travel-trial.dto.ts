import { Type } from 'class-transformer';
import { ArrayMaxSize, IsArray, IsBoolean, IsObject, ValidateNested } from 'class-validator';
import type { LengthUnit } from '../../engine/units.js';
import { MAX_POINTS } from '../../engine/validate.js';
import { FiniteNumber, ReadingUnit } from './validators.js';
import { Optional } from '../../common/optional.js';

export class TravelMoveDto {
  /** Commanded move, mm. */
  @FiniteNumber('commanded')
  commanded: number;

  /** Measured move in `unit`. */
  @FiniteNumber('measured')
  measured: number;
}

export class TravelTrialDto {
  @FiniteNumber('stepsPerMmUsed')
  stepsPerMmUsed: number;

  @IsArray({ message: 'moves must be a list of {commanded, measured}' })
  @ArrayMaxSize(MAX_POINTS, { message: `moves has more than ${MAX_POINTS} values; at most ${MAX_POINTS} are accepted` })
  @IsObject({ each: true, message: 'every entry of moves must be {commanded, measured}' })
  @ValidateNested({ each: true })
  @Type(() => TravelMoveDto)
  moves: TravelMoveDto[];

  @ReadingUnit()
  unit?: LengthUnit;

  /** Fit without an offset (moves measured from a zeroed start). */
  @Optional()
  @IsBoolean({ message: 'throughOrigin must be true or false' })
  throughOrigin?: boolean;
}

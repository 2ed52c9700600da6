import { Type } from 'class-transformer';
import { ArrayMaxSize, IsArray, IsBoolean, IsObject, ValidateNested } from 'class-validator';
import { MAX_POINTS } from '../../engine/validate.js';
import { FiniteNumber, OptionalFiniteNumber } from './validators.js';
import { UnitFamiliesDto } from './unit-families.dto.js';
import { Optional } from '../../common/optional.js';

export class TravelMoveDto {
  /** Commanded move, in `lengthUnit`. */
  @FiniteNumber('commanded')
  commanded: number;

  /** Measured move, in `lengthUnit` too: both are moves of the axis. */
  @FiniteNumber('measured')
  measured: number;
}

export class TravelTrialDto extends UnitFamiliesDto {
  /** Steps per mm set in the controller while the moves were made. */
  @FiniteNumber('stepsPerMmUsed')
  stepsPerMmUsed: number;

  /** Steps per mm worked out from the drive; a correction far from it is flagged (the value in use when absent). */
  @OptionalFiniteNumber('theoreticalStepsPerMm')
  theoreticalStepsPerMm?: number;

  @IsArray({ message: 'moves must be a list of {commanded, measured}' })
  @ArrayMaxSize(MAX_POINTS, { message: `moves has more than ${MAX_POINTS} values; at most ${MAX_POINTS} are accepted` })
  @IsObject({ each: true, message: 'every entry of moves must be {commanded, measured}' })
  @ValidateNested({ each: true })
  @Type(() => TravelMoveDto)
  moves: TravelMoveDto[];

  /** Fit without an offset (moves measured from a zeroed start). */
  @Optional()
  @IsBoolean({ message: 'throughOrigin must be true or false' })
  throughOrigin?: boolean;
}

import { Type } from 'class-transformer';
import { ArrayMaxSize, ArrayMinSize, IsArray, IsBoolean, IsIn, IsObject, IsString, MaxLength, ValidateNested } from 'class-validator';
import { LENGTH_UNITS, type LengthUnit } from '../../engine/units.js';
import { Finite, OptionalFinite } from './validators.js';
import { Optional } from '../../common/optional.js';

export class TravelMoveDto {
  /** Commanded move, mm (the test program runs in G21). */
  @Finite('moves[].commanded')
  commanded: number;

  /** Measured move, in the trial's unit. */
  @Finite('moves[].measured')
  measured: number;
}

export class CreateTravelTrialDto {
  @IsIn(LENGTH_UNITS, { message: `unit must be one of ${LENGTH_UNITS.join(', ')}` })
  unit: LengthUnit;

  /** Steps per mm in the controller while the moves were made; the axis's value when absent. */
  @OptionalFinite('stepsPerMmUsed')
  stepsPerMmUsed?: number;

  @IsArray({ message: 'moves must be a list of {commanded, measured}' })
  @ArrayMinSize(1, { message: 'moves needs at least one {commanded, measured} pair' })
  @ArrayMaxSize(200, { message: 'moves holds at most 200 pairs' })
  @IsObject({ each: true, message: 'every entry of moves must be {commanded, measured}' })
  @ValidateNested({ each: true })
  @Type(() => TravelMoveDto)
  moves: TravelMoveDto[];

  /** Fit measured = scale × commanded with no offset (moves measured from a zeroed start). */
  @Optional()
  @IsBoolean({ message: 'throughOrigin must be true or false' })
  throughOrigin?: boolean;

  @Optional()
  @IsString({ message: 'notes must be text' })
  @MaxLength(2000, { message: 'notes must be at most 2000 characters' })
  notes?: string;
}

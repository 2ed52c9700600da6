import { Type } from 'class-transformer';
import { IsObject, IsString, Matches, MaxLength, ValidateNested } from 'class-validator';
import { DriveDto } from './drive.dto.js';
import { Finite, OptionalFinite } from './validators.js';
import { Optional } from '../../common/optional.js';

export class CreateAxisDto {
  /** "X", "Y1", "Y2", "Z": the first letter is the axis letter the test program moves. */
  @IsString({ message: 'name must be text such as X, Y1 or Z' })
  @Matches(/\S/, { message: 'name is required (X, Y1, Z…)' })
  @MaxLength(40, { message: 'name must be at most 40 characters' })
  name: string;

  @IsObject({ message: 'drive must be an object {type, …}' })
  @ValidateNested()
  @Type(() => DriveDto)
  drive: DriveDto;

  @Finite('motorStepsPerRev')
  motorStepsPerRev: number;

  @Finite('microsteps')
  microsteps: number;

  /** Motor revolutions per revolution of the screw, pulley or pinion; 1 when direct. */
  @OptionalFinite('gearRatio')
  gearRatio?: number;

  /** The value set in the controller now. */
  @Finite('stepsPerMm')
  stepsPerMm: number;

  /** The fastest feed rate the axis will be asked for, mm/min. */
  @OptionalFinite('maxFeedRate')
  maxFeedRate?: number;

  @OptionalFinite('measuredTravelMm')
  measuredTravelMm?: number;

  @Optional()
  @IsString({ message: 'notes must be text' })
  @MaxLength(5000, { message: 'notes must be at most 5000 characters' })
  notes?: string;
}

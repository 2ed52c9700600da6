import { Type } from 'class-transformer';
import { IsObject, IsString, Matches, MaxLength, ValidateNested } from 'class-validator';
import { DriveDto } from './drive.dto.js';
import { Finite, OptionalFinite } from './validators.js';
import { Optional } from '../../common/optional.js';
import { LengthUnitField } from '../../common/unit-fields.js';
import type { LengthUnit } from '../../engine/units.js';

export class CreateAxisDto {
  /** "X", "Y1", "Y2", "Z": the first letter is the axis letter the test program moves. */
  @IsString({ message: 'name must be text such as X, Y1 or Z' })
  @Matches(/\S/, { message: 'name is required (X, Y1, Z…)' })
  @MaxLength(40, { message: 'name must be at most 40 characters' })
  name: string;

  /** The unit the axis is set up in: drive lengths, feed rates (per minute) and travel are typed in it. */
  @LengthUnitField()
  lengthUnit?: LengthUnit;

  @IsObject({ message: 'drive must be an object {type, …}' })
  @ValidateNested()
  @Type(() => DriveDto)
  drive: DriveDto;

  /** Full steps per motor revolution (a count: 200 for a 1.8° motor). */
  @Finite('motorStepsPerRev')
  motorStepsPerRev: number;

  /** Microsteps per full step set on the driver (a count). */
  @Finite('microsteps')
  microsteps: number;

  /** Motor revolutions per revolution of the screw, pulley or pinion (a ratio, no unit); 1 when direct. */
  @OptionalFinite('gearRatio')
  gearRatio?: number;

  /** The value set in the controller now, in steps per mm. */
  @Finite('stepsPerMm')
  stepsPerMm: number;

  /** The fastest feed rate the axis will be asked for, lengthUnit per minute. */
  @OptionalFinite('maxFeedRate')
  maxFeedRate?: number;

  /** Travel measured end to end, in lengthUnit. */
  @OptionalFinite('measuredTravel')
  measuredTravel?: number;

  /** The same in mm whatever lengthUnit says (older callers); not together with measuredTravel. */
  @OptionalFinite('measuredTravelMm')
  measuredTravelMm?: number;

  @Optional()
  @IsString({ message: 'notes must be text' })
  @MaxLength(5000, { message: 'notes must be at most 5000 characters' })
  notes?: string;
}

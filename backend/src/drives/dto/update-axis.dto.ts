import { Type } from 'class-transformer';
import { IsObject, IsString, Matches, MaxLength, ValidateIf, ValidateNested } from 'class-validator';
import { DriveDto } from './drive.dto.js';
import { Finite, OptionalFinite } from './validators.js';
import { Optional } from '../../common/optional.js';
import { LengthUnitField } from '../../common/unit-fields.js';
import type { LengthUnit } from '../../engine/units.js';

/** Every field optional; a drive given replaces the whole drive. null clears maxFeedRate or measuredTravelMm. */
export class UpdateAxisDto {
  @Optional()
  @IsString({ message: 'name must be text such as X, Y1 or Z' })
  @Matches(/\S/, { message: 'name must not be empty' })
  @MaxLength(40, { message: 'name must be at most 40 characters' })
  name?: string;

  /** The unit the axis is set up in; lengths sent with it are in it, and the axis shows its values in it. */
  @LengthUnitField()
  lengthUnit?: LengthUnit;

  @Optional()
  @IsObject({ message: 'drive must be an object {type, …}' })
  @ValidateNested()
  @Type(() => DriveDto)
  drive?: DriveDto;

  @OptionalFinite('motorStepsPerRev')
  motorStepsPerRev?: number;

  @OptionalFinite('microsteps')
  microsteps?: number;

  @OptionalFinite('gearRatio')
  gearRatio?: number;

  @OptionalFinite('stepsPerMm')
  stepsPerMm?: number;

  @ValidateIf((_, v) => v !== null && v !== undefined)
  @Finite('maxFeedRate')
  maxFeedRate?: number | null;

  /** Travel measured end to end, in lengthUnit; null clears it. */
  @ValidateIf((_, v) => v !== null && v !== undefined)
  @Finite('measuredTravel')
  measuredTravel?: number | null;

  /** The same in mm whatever lengthUnit says (older callers); not together with measuredTravel. */
  @ValidateIf((_, v) => v !== null && v !== undefined)
  @Finite('measuredTravelMm')
  measuredTravelMm?: number | null;

  @Optional()
  @IsString({ message: 'notes must be text' })
  @MaxLength(5000, { message: 'notes must be at most 5000 characters' })
  notes?: string;
}

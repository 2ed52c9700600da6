import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsBoolean,
  IsObject,
  IsString,
  MaxLength,
  ValidateNested,
} from 'class-validator';
import type { LengthUnit } from '../../engine/units.js';
import { LengthUnitField, ReadingUnitField } from '../../common/unit-fields.js';
import { Finite, OptionalFinite } from './validators.js';
import { Optional } from '../../common/optional.js';
import { ReplacedUnitField } from './replaced-unit.js';
import { TemperatureFieldsDto } from './temperature-fields.js';
import { ApiHideProperty } from '@nestjs/swagger';

export class TravelMoveDto {
  /** Commanded move, in lengthUnit. */
  @Finite('moves[].commanded')
  commanded: number;

  /** Measured move, in lengthUnit. */
  @Finite('moves[].measured')
  measured: number;
}

export class CreateTravelTrialDto extends TemperatureFieldsDto {
  /** Unit of the commanded and the measured moves (mm when absent). */
  @LengthUnitField()
  lengthUnit?: LengthUnit;

  /** Unit the errors and residuals are shown in, and the instrument resolution is typed in (mm when absent). */
  @ReadingUnitField()
  readingUnit?: LengthUnit;

  /** The old single unit field: refused, naming lengthUnit and readingUnit. */
  @ReplacedUnitField()
  @ApiHideProperty() // refused when sent, so not part of the described request
  unit?: undefined;

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

export class ApplyTravelTrialDto {
  /** Needed when the correction is more than 5 % from the drive's theoretical steps per mm. */
  @Optional()
  @IsBoolean({ message: 'confirmFarCorrection must be true or false' })
  confirmFarCorrection?: boolean;
}

import {
  IsDefined,
  IsInt,
  IsNumber,
  IsString,
  IsUUID,
  Matches,
  Max,
  MaxLength,
  Min,
  MinLength,
  ValidateIf,
} from 'class-validator';
import type { LengthUnit } from '../../engine/units.js';
import { LengthUnitField } from '../../common/unit-fields.js';
import { Optional } from '../../common/optional.js';
import { ReplacedUnitField } from './replaced-unit.js';
import { ApiHideProperty } from '@nestjs/swagger';

const FINITE = { allowNaN: false, allowInfinity: false } as const;
const IN_UNIT = 'in lengthUnit (mm when absent)';

/** A new rail: label, axis and geometry required; lengths in `lengthUnit`, bounded in mm by the service. */
export class CreateRailDto {
  @IsDefined({ message: 'label is required, e.g. "Y1 (left)"' })
  @IsString({ message: 'label must be text, e.g. "Y1 (left)"' })
  @MinLength(1, { message: 'label must not be empty' })
  @MaxLength(60, { message: 'label must be at most 60 characters' })
  label: string;

  @IsDefined({ message: 'axis is required, e.g. X, Y1, Y2, Z' })
  @IsString({ message: 'axis must be text, e.g. X, Y1, Y2, Z' })
  @Matches(/^[A-Za-z][A-Za-z0-9]{0,5}$/, { message: 'axis must be a short axis name such as X, Y1, Y2 or Z' })
  axis: string;

  @LengthUnitField()
  lengthUnit?: LengthUnit;

  @ReplacedUnitField()
  @ApiHideProperty() // refused when sent, so not part of the described request
  unit?: never;

  /** Rail length, in lengthUnit. */
  @IsDefined({ message: 'length is required, in lengthUnit' })
  @IsNumber(FINITE, { message: `length must be a number ${IN_UNIT}` })
  @Min(0, { message: 'length must be positive' })
  length: number;

  /** Profile (rail) size in mm whatever lengthUnit: the catalogue size, 15, 20, 25 …; null clears it. */
  @Optional()
  @ValidateIf((_, v) => v !== null)
  @IsInt({ message: 'profileSize must be a whole number of mm (the catalogue size: 15, 20, 25)' })
  @Min(5, { message: 'profileSize must be at least 5 mm' })
  @Max(100, { message: 'profileSize must be at most 100 mm' })
  profileSize?: number | null;

  /** Distance between neighbouring mounting holes, in lengthUnit. */
  @IsDefined({ message: 'holePitch is required, in lengthUnit' })
  @IsNumber(FINITE, { message: `holePitch must be a number ${IN_UNIT}` })
  @Min(0, { message: 'holePitch must be positive' })
  holePitch: number;

  /** First hole's centre from the rail's start, in lengthUnit. */
  @IsDefined({ message: 'firstHole is required, in lengthUnit' })
  @IsNumber(FINITE, { message: `firstHole must be a number ${IN_UNIT} from the rail's start` })
  @Min(0, { message: 'firstHole must not be negative' })
  firstHole: number;

  /** Centre-to-centre distance to the partner rail (a in S = a × K), in `lengthUnit`; null clears it. */
  @Optional()
  @ValidateIf((_, v) => v !== null)
  @IsNumber(FINITE, { message: `spacing must be a number ${IN_UNIT}: the distance between partner rails` })
  @Min(0, { message: 'spacing must be positive' })
  spacing?: number | null;

  /** Least distance from a hole centre to either end, in `lengthUnit`; null: half the bolt head (common practice). */
  @Optional()
  @ValidateIf((_, v) => v !== null)
  @IsNumber(FINITE, { message: `endDistance must be a number ${IN_UNIT}` })
  @Min(0, { message: 'endDistance must not be negative' })
  endDistance?: number | null;

  @Optional()
  @ValidateIf((_, v) => v !== null)
  @IsUUID('all', { message: 'partnerRailId must be the id of another rail of this machine' })
  partnerRailId?: string | null;
}

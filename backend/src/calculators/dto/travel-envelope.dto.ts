import { Type } from 'class-transformer';
import { ArrayMaxSize, IsArray, IsObject, IsString, MaxLength, MinLength, ValidateNested } from 'class-validator';
import { FiniteNumber, OptionalFiniteNumber } from './validators.js';
import { UnitFamiliesDto } from './unit-families.dto.js';

export class AxisTravelDto {
  @IsString({ message: 'axis must name the axis' })
  @MinLength(1, { message: 'axis must name the axis' })
  @MaxLength(20, { message: 'axis must be at most 20 characters' })
  axis: string;

  /** Travel measured end to end, in lengthUnit. */
  @FiniteNumber('measuredTravel')
  measuredTravel: number;

  /** Work size along the axis, in lengthUnit. */
  @FiniteNumber('workSize')
  workSize: number;
}

/** Travel, work size and margin in `lengthUnit`. */
export class TravelEnvelopeDto extends UnitFamiliesDto {
  @IsArray({ message: 'axes must be a list of {axis, measuredTravel, workSize}' })
  @ArrayMaxSize(12, { message: 'axes has more than 12 entries' })
  @IsObject({ each: true, message: 'every entry of axes must be {axis, measuredTravel, workSize}' })
  @ValidateNested({ each: true })
  @Type(() => AxisTravelDto)
  axes: AxisTravelDto[];

  /** Clearance beyond the work at each end of every axis, in `lengthUnit`. */
  @OptionalFiniteNumber('marginPerSide')
  marginPerSide?: number;
}

import { IsInt, IsNumber, IsString, IsUUID, Matches, Max, MaxLength, Min, MinLength, ValidateIf } from 'class-validator';
import { Optional } from '../../common/optional.js';

const FINITE = { allowNaN: false, allowInfinity: false } as const;

export class CreateRailDto {
  @IsString({ message: 'label must be text, e.g. "Y1 (left)"' })
  @MinLength(1, { message: 'label is required' })
  @MaxLength(60, { message: 'label must be at most 60 characters' })
  label: string;

  @IsString({ message: 'axis must be text, e.g. X, Y1, Y2, Z' })
  @Matches(/^[A-Za-z][A-Za-z0-9]{0,5}$/, { message: 'axis must be a short axis name such as X, Y1, Y2 or Z' })
  axis: string;

  @IsNumber(FINITE, { message: 'lengthMm must be a number of mm' })
  @Min(10, { message: 'lengthMm must be at least 10 mm' })
  @Max(20_000, { message: 'lengthMm must be at most 20 000 mm' })
  lengthMm: number;

  @Optional()
  @IsInt({ message: 'profileSize must be a whole number of mm (e.g. 15, 20, 25)' })
  @Min(5, { message: 'profileSize must be at least 5 mm' })
  @Max(100, { message: 'profileSize must be at most 100 mm' })
  profileSize?: number;

  @IsNumber(FINITE, { message: 'holePitchMm must be a number of mm' })
  @Min(5, { message: 'holePitchMm must be at least 5 mm' })
  @Max(1000, { message: 'holePitchMm must be at most 1000 mm' })
  holePitchMm: number;

  @IsNumber(FINITE, { message: 'firstHoleMm must be a number of mm' })
  @Min(0, { message: 'firstHoleMm must not be negative' })
  firstHoleMm: number;

  @Optional()
  @ValidateIf((_, v) => v !== null)
  @IsUUID('all', { message: 'partnerRailId must be the id of another rail of this machine' })
  partnerRailId?: string | null;
}

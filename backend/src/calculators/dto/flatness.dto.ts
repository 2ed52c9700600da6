import { Type } from 'class-transformer';
import { ArrayMaxSize, IsArray, IsObject, ValidateNested } from 'class-validator';
import { MAX_POINTS } from '../../engine/validate.js';
import { FiniteNumber } from './validators.js';
import { UnitFamiliesDto } from './unit-families.dto.js';

export class GridPointDto {
  /** Position on the bed, in `lengthUnit`. */
  @FiniteNumber('x')
  x: number;

  /** Position on the bed, in `lengthUnit`. */
  @FiniteNumber('y')
  y: number;

  /** Height reading in `readingUnit`. */
  @FiniteNumber('z')
  z: number;
}

export class FlatnessDto extends UnitFamiliesDto {
  @IsArray({ message: 'points must be a list of {x, y, z}' })
  @ArrayMaxSize(MAX_POINTS, {
    message: `points has more than ${MAX_POINTS} values; at most ${MAX_POINTS} are accepted`,
  })
  @IsObject({ each: true, message: 'every entry of points must be {x, y, z}' })
  @ValidateNested({ each: true })
  @Type(() => GridPointDto)
  points: GridPointDto[];
}

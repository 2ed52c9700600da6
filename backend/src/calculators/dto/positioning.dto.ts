import { Type } from 'class-transformer';
import { ArrayMaxSize, IsArray, IsIn, IsObject, ValidateNested } from 'class-validator';
import type { Direction } from '../../engine/positioning.js';
import { MAX_POINTS } from '../../engine/validate.js';
import { NumberList } from './validators.js';
import { UnitFamiliesDto } from './unit-families.dto.js';

export class PositioningRunDto {
  @IsIn(['up', 'down'], { message: 'direction must be up or down' })
  direction: Direction;

  /** Actual − target at each target, in `readingUnit`. */
  @NumberList('deviations')
  deviations: number[];
}

export class PositioningDto extends UnitFamiliesDto {
  /** Target positions, in `lengthUnit`. */
  @NumberList('targets')
  targets: number[];

  @IsArray({ message: 'runs must be a list of {direction, deviations}' })
  @ArrayMaxSize(MAX_POINTS, { message: `runs has more than ${MAX_POINTS} entries` })
  @IsObject({ each: true, message: 'every entry of runs must be {direction, deviations}' })
  @ValidateNested({ each: true })
  @Type(() => PositioningRunDto)
  runs: PositioningRunDto[];
}

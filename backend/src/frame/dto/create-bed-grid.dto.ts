import { Type } from 'class-transformer';
import { ArrayMaxSize, ArrayMinSize, IsArray, IsInt, IsObject, Max, Min, ValidateNested } from 'class-validator';
import type { LengthUnit } from '../../engine/units.js';
import { LengthUnitField, ReadingUnitField } from '../../common/unit-fields.js';
import { FiniteNumber, NoSingleUnit, OptionalNote, OptionalPositive } from './fields.js';
import { Optional } from '../../common/optional.js';
import { ApiHideProperty } from '@nestjs/swagger';

export const MAX_GRID_POINTS = 2500;

export class GridPointDto {
  /** Position across the bed, in lengthUnit. */
  @FiniteNumber('points[].x')
  x: number;

  /** Position along the bed, in lengthUnit. */
  @FiniteNumber('points[].y')
  y: number;

  /** Height at the point as the gantry-carried gauge reads it, in readingUnit. */
  @FiniteNumber('points[].z')
  z: number;
}

export class CreateBedGridDto {
  /** Unit of the grid positions x and y (mm when absent). */
  @LengthUnitField()
  lengthUnit?: LengthUnit;

  /** Unit of the heights z and of the gauge's resolution (mm when absent). */
  @ReadingUnitField()
  readingUnit?: LengthUnit;

  @NoSingleUnit()
  @ApiHideProperty() // refused when sent, so not part of the described request
  unit?: unknown;

  /** Smallest step of the height gauge, in readingUnit. */
  @OptionalPositive('resolution')
  resolution?: number;

  /** Count of rows of the grid (points along the bed). */
  @Optional()
  @IsInt({ message: 'rows must be a whole number' })
  @Min(1, { message: 'rows must be at least 1' })
  @Max(50, { message: 'rows must be at most 50' })
  rows?: number;

  /** Count of columns of the grid (points across the bed). */
  @Optional()
  @IsInt({ message: 'columns must be a whole number' })
  @Min(1, { message: 'columns must be at least 1' })
  @Max(50, { message: 'columns must be at most 50' })
  columns?: number;

  @IsArray({ message: 'points must be a list of {x, y, z}' })
  @ArrayMinSize(3, { message: 'points needs at least 3 points for a plane' })
  @ArrayMaxSize(MAX_GRID_POINTS, { message: `points has more than ${MAX_GRID_POINTS} entries` })
  @IsObject({ each: true, message: 'every entry of points must be {x, y, z}' })
  @ValidateNested({ each: true })
  @Type(() => GridPointDto)
  points: GridPointDto[];

  @OptionalNote()
  note?: string;
}

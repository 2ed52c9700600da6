import { Type } from 'class-transformer';
import { ArrayMaxSize, IsArray, IsIn, IsNumber, IsObject, IsString, MaxLength, ValidateNested } from 'class-validator';
import type { Direction } from '../../engine/positioning.js';
import type { LengthUnit } from '../../engine/units.js';
import { LengthUnitField, ReadingUnitField } from '../../common/unit-fields.js';
import { Optional } from '../../common/optional.js';
import { ReplacedUnitField } from './replaced-unit.js';
import { TemperatureFieldsDto } from './temperature-fields.js';
import { ApiHideProperty } from '@nestjs/swagger';

const FINITE = { allowNaN: false, allowInfinity: false } as const;

export class PositioningRunEntryDto {
  @IsIn(['up', 'down'], { message: 'runs[].direction must be up or down' })
  direction: Direction;

  /** Actual − target at each target, in readingUnit. */
  @IsArray({ message: 'runs[].deviations must be a list of numbers' })
  @ArrayMaxSize(500, { message: 'runs[].deviations holds at most 500 values' })
  @IsNumber(FINITE, { each: true, message: 'every value in runs[].deviations must be a finite number' })
  deviations: number[];
}

export class CreatePositioningRunDto extends TemperatureFieldsDto {
  /** Unit of the target positions (mm when absent). */
  @LengthUnitField()
  lengthUnit?: LengthUnit;

  /** Unit of the deviations and the instrument resolution (mm when absent). */
  @ReadingUnitField()
  readingUnit?: LengthUnit;

  /** The old single unit field: refused, naming lengthUnit and readingUnit. */
  @ReplacedUnitField()
  @ApiHideProperty() // refused when sent, so not part of the described request
  unit?: undefined;

  /** Target positions along the axis, in lengthUnit, ascending. */
  @IsArray({ message: 'targets must be a list of numbers (in lengthUnit)' })
  @ArrayMaxSize(500, { message: 'targets holds at most 500 positions' })
  @IsNumber(FINITE, { each: true, message: 'every value in targets must be a finite number' })
  targets: number[];

  @IsArray({ message: 'runs must be a list of {direction, deviations}' })
  @ArrayMaxSize(100, { message: 'runs holds at most 100 runs' })
  @IsObject({ each: true, message: 'every entry of runs must be {direction, deviations}' })
  @ValidateNested({ each: true })
  @Type(() => PositioningRunEntryDto)
  runs: PositioningRunEntryDto[];

  @Optional()
  @IsString({ message: 'notes must be text' })
  @MaxLength(2000, { message: 'notes must be at most 2000 characters' })
  notes?: string;
}

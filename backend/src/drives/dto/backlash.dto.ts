import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsEmpty,
  IsNumber,
  IsObject,
  IsString,
  MaxLength,
  Min,
  ValidateNested,
} from 'class-validator';
import { Optional } from '../../common/optional.js';
import { LengthUnitField, ReadingUnitField, UNIT_FAMILY_HINT } from '../../common/unit-fields.js';
import type { LengthUnit } from '../../engine/units.js';
import { MIN_APPROACHES } from '../../engine/backlash.js';
import { ApiHideProperty } from '@nestjs/swagger';

const FINITE = { allowNaN: false, allowInfinity: false } as const;

export class BacklashPositionDto {
  /** Where along the axis, in lengthUnit. */
  @IsNumber(FINITE, { message: 'positions[].position must be a finite number (in lengthUnit)' })
  position: number;

  /** Readings after approaching while moving in the positive direction, in readingUnit. */
  @IsArray({ message: 'positions[].up must be a list of readings (in readingUnit)' })
  @ArrayMinSize(MIN_APPROACHES, {
    message: `positions[].up needs at least ${MIN_APPROACHES} approaches from the negative side moving up`,
  })
  @ArrayMaxSize(50, { message: 'positions[].up holds at most 50 readings' })
  @IsNumber(FINITE, { each: true, message: 'every value in positions[].up must be a finite number' })
  up: number[];

  /** Readings after approaching while moving in the negative direction, in readingUnit. */
  @IsArray({ message: 'positions[].down must be a list of readings (in readingUnit)' })
  @ArrayMinSize(MIN_APPROACHES, {
    message: `positions[].down needs at least ${MIN_APPROACHES} approaches from the positive side moving down`,
  })
  @ArrayMaxSize(50, { message: 'positions[].down holds at most 50 readings' })
  @IsNumber(FINITE, { each: true, message: 'every value in positions[].down must be a finite number' })
  down: number[];
}

export class CreateBacklashCheckDto {
  /** The single unit field of earlier versions: refused with a pointer to the two families. */
  @Optional()
  @IsEmpty({
    message: `unit is no longer accepted: send lengthUnit for the positions and readingUnit for the readings (${UNIT_FAMILY_HINT})`,
  })
  @ApiHideProperty() // refused when sent, so not part of the described request
  unit?: never;

  @LengthUnitField()
  lengthUnit?: LengthUnit;

  @ReadingUnitField()
  readingUnit?: LengthUnit;

  /** One near each end of the travel and one near its middle (more are welcome). */
  @IsArray({ message: 'positions must be a list of {position, up, down}' })
  @ArrayMinSize(3, {
    message: 'positions needs at least 3 entries: one near each end of the travel and one near its middle',
  })
  @ArrayMaxSize(50, { message: 'positions holds at most 50 entries' })
  @IsObject({ each: true, message: 'every entry of positions must be {position, up, down}' })
  @ValidateNested({ each: true })
  @Type(() => BacklashPositionDto)
  positions: BacklashPositionDto[];

  /** Smallest step the indicator reads, in readingUnit. */
  @Optional()
  @IsNumber(FINITE, { message: 'resolution must be a number (in readingUnit)' })
  @Min(0.0000001, { message: 'resolution must be greater than zero (in readingUnit)' })
  resolution?: number;

  @Optional()
  @IsString({ message: 'notes must be text' })
  @MaxLength(2000, { message: 'notes must be at most 2000 characters' })
  notes?: string;
}

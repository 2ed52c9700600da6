import { LengthUnitField } from '../../common/unit-fields.js';
import { ReplacedUnitField } from '../../rails/dto/replaced-unit.js';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsIn,
  IsInt,
  IsNumber,
  IsObject,
  IsString,
  Max,
  MaxLength,
  Min,
  MinLength,
  ValidateIf,
  ValidateNested,
} from 'class-validator';
import { Optional } from '../../common/optional.js';
import {
  PATTERN_ENTRIES,
  PATTERN_REFERENCES,
  type PatternEntryKind,
  type PatternReference,
  type PatternUnit,
} from '../../database/schema/hole-patterns.js';
import { ApiHideProperty } from '@nestjs/swagger';

const FINITE = { allowNaN: false, allowInfinity: false } as const;
/** Coordinates and sizes are bounded in the entered unit here; the service bounds them in mm. */
// Bounds are written as plain numbers where they are negative: the API description reads a
// negative bound only as a literal (-LIMIT or -1_000_000 would drop the field from it).
const LIMIT = 100_000;
export const MAX_HOLES = 1000;

export class HoleDto {
  /** Hole centre from the outline's left edge, in lengthUnit. */
  @IsNumber(FINITE, { message: 'x must be a number in lengthUnit (from the outline’s left edge)' })
  @Min(-100000, { message: `x must be within ±${LIMIT}` })
  @Max(LIMIT, { message: `x must be within ±${LIMIT}` })
  x: number;

  /** Hole centre from the outline's lower edge, in lengthUnit. */
  @IsNumber(FINITE, { message: 'y must be a number in lengthUnit (from the outline’s lower edge)' })
  @Min(-100000, { message: `y must be within ±${LIMIT}` })
  @Max(LIMIT, { message: `y must be within ±${LIMIT}` })
  y: number;

  /** Hole diameter, in lengthUnit. */
  @IsNumber(FINITE, { message: 'diameter must be a number in lengthUnit' })
  @Min(0, { message: 'diameter must be greater than 0' })
  @Max(LIMIT, { message: `diameter must be at most ${LIMIT}` })
  diameter: number;
}

export class GridDto {
  /** First hole's centre from the outline's left edge, in lengthUnit. */
  @IsNumber(FINITE, { message: 'originX must be the x of the first hole, in lengthUnit' })
  @Min(-100000, { message: `originX must be within ±${LIMIT}` })
  @Max(LIMIT, { message: `originX must be within ±${LIMIT}` })
  originX: number;

  /** First hole's centre from the outline's lower edge, in lengthUnit. */
  @IsNumber(FINITE, { message: 'originY must be the y of the first hole, in lengthUnit' })
  @Min(-100000, { message: `originY must be within ±${LIMIT}` })
  @Max(LIMIT, { message: `originY must be within ±${LIMIT}` })
  originY: number;

  /** Count of rows of holes. */
  @IsInt({ message: 'rows must be a whole number' })
  @Min(1, { message: 'rows must be at least 1' })
  @Max(100, { message: 'rows must be at most 100' })
  rows: number;

  /** Count of columns of holes. */
  @IsInt({ message: 'columns must be a whole number' })
  @Min(1, { message: 'columns must be at least 1' })
  @Max(100, { message: 'columns must be at most 100' })
  columns: number;

  /** Distance between columns, in lengthUnit. */
  @IsNumber(FINITE, { message: 'pitchX must be the distance between columns, in lengthUnit' })
  @Min(0, { message: 'pitchX must not be negative' })
  @Max(LIMIT, { message: `pitchX must be at most ${LIMIT}` })
  pitchX: number;

  /** Distance between rows, in lengthUnit. */
  @IsNumber(FINITE, { message: 'pitchY must be the distance between rows, in lengthUnit' })
  @Min(0, { message: 'pitchY must not be negative' })
  @Max(LIMIT, { message: `pitchY must be at most ${LIMIT}` })
  pitchY: number;

  /** Hole diameter, in lengthUnit. */
  @IsNumber(FINITE, { message: 'diameter must be a number in lengthUnit' })
  @Min(0, { message: 'diameter must be greater than 0' })
  @Max(LIMIT, { message: `diameter must be at most ${LIMIT}` })
  diameter: number;
}

export class CircleDto {
  /** Circle centre from the outline's left edge, in lengthUnit. */
  @IsNumber(FINITE, { message: 'centreX must be the x of the circle’s centre, in lengthUnit' })
  @Min(-100000, { message: `centreX must be within ±${LIMIT}` })
  @Max(LIMIT, { message: `centreX must be within ±${LIMIT}` })
  centreX: number;

  /** Circle centre from the outline's lower edge, in lengthUnit. */
  @IsNumber(FINITE, { message: 'centreY must be the y of the circle’s centre, in lengthUnit' })
  @Min(-100000, { message: `centreY must be within ±${LIMIT}` })
  @Max(LIMIT, { message: `centreY must be within ±${LIMIT}` })
  centreY: number;

  /** Diameter of the circle the hole centres lie on, in lengthUnit. */
  @IsNumber(FINITE, { message: 'circleDiameter must be the diameter the hole centres lie on, in lengthUnit' })
  @Min(0, { message: 'circleDiameter must not be negative' })
  @Max(LIMIT, { message: `circleDiameter must be at most ${LIMIT}` })
  circleDiameter: number;

  /** Count of holes on the circle. */
  @IsInt({ message: 'count must be a whole number of holes' })
  @Min(1, { message: 'count must be at least 1' })
  @Max(360, { message: 'count must be at most 360' })
  count: number;

  /** Angle of the first hole from the +x direction, counter-clockwise, in degrees. */
  @IsNumber(FINITE, { message: 'startAngleDeg must be an angle in degrees from the +x direction' })
  @Min(-360, { message: 'startAngleDeg must be within ±360°' })
  @Max(360, { message: 'startAngleDeg must be within ±360°' })
  startAngleDeg: number;

  /** Hole diameter, in lengthUnit. */
  @IsNumber(FINITE, { message: 'diameter must be a number in lengthUnit' })
  @Min(0, { message: 'diameter must be greater than 0' })
  @Max(LIMIT, { message: `diameter must be at most ${LIMIT}` })
  diameter: number;
}

/** A pattern as entered: an outline, its reference, and holes as a list, a grid or a bolt circle. */
export class HolePatternDto {
  @IsString({ message: 'name must be text, e.g. "Y1 motor bracket"' })
  @MinLength(1, { message: 'name is required' })
  @MaxLength(80, { message: 'name must be at most 80 characters' })
  name: string;

  @IsIn(PATTERN_REFERENCES, { message: `reference must be one of ${PATTERN_REFERENCES.join(', ')}` })
  reference: PatternReference;

  /** Unit of the outline and every coordinate and diameter of the entry; mm when absent. */
  @LengthUnitField()
  lengthUnit?: PatternUnit;

  @ReplacedUnitField()
  @ApiHideProperty() // refused when sent, so not part of the described request
  unit?: never;

  /** Outline width, in lengthUnit. */
  @IsNumber(FINITE, { message: 'width must be the outline’s width, in lengthUnit' })
  @Min(0, { message: 'width must be greater than 0' })
  @Max(LIMIT, { message: `width must be at most ${LIMIT}` })
  width: number;

  /** Outline height, in lengthUnit. */
  @IsNumber(FINITE, { message: 'height must be the outline’s height, in lengthUnit' })
  @Min(0, { message: 'height must be greater than 0' })
  @Max(LIMIT, { message: `height must be at most ${LIMIT}` })
  height: number;

  @IsIn(PATTERN_ENTRIES, { message: 'entry must be list, grid or circle' })
  entry: PatternEntryKind;

  @ValidateIf((o: HolePatternDto) => o.entry === 'list' || o.holes !== undefined)
  @IsArray({ message: 'holes must be a list of holes (x, y, diameter) when entry is list' })
  @ArrayMinSize(1, { message: 'holes must hold at least one hole' })
  @ArrayMaxSize(MAX_HOLES, { message: `holes must hold at most ${MAX_HOLES} holes` })
  @IsObject({ each: true, message: 'every entry of holes must be {x, y, diameter}' })
  @ValidateNested({ each: true })
  @Type(() => HoleDto)
  holes?: HoleDto[];

  @ValidateIf((o: HolePatternDto) => o.entry === 'grid' || o.grid !== undefined)
  @IsObject({
    message: 'grid must give originX, originY, rows, columns, pitchX, pitchY and diameter when entry is grid',
  })
  @ValidateNested()
  @Type(() => GridDto)
  grid?: GridDto;

  @ValidateIf((o: HolePatternDto) => o.entry === 'circle' || o.circle !== undefined)
  @IsObject({
    message:
      'circle must give centreX, centreY, circleDiameter, count, startAngleDeg and diameter when entry is circle',
  })
  @ValidateNested()
  @Type(() => CircleDto)
  circle?: CircleDto;

  @Optional()
  @IsString({ message: 'notes must be text' })
  @MaxLength(500, { message: 'notes must be at most 500 characters' })
  notes?: string;
}

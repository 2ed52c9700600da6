import { Transform } from 'class-transformer';
import { IsIn, IsNumber, IsString, Matches, MaxLength } from 'class-validator';
import { Optional } from '../../common/optional.js';
import { LengthUnitField } from '../../common/unit-fields.js';
import type { LengthUnit } from '../../engine/units.js';

const FINITE = { allowNaN: false, allowInfinity: false } as const;
const toNumber = ({ value }: { value: unknown }) => (value === undefined || value === '' ? undefined : Number(value));

/**
 * Query of GET /api/axes/:id/test-program. Positions, distances, the overrun and the feed are in
 * `lengthUnit` (mm when absent; feed per minute); the program itself is written in the unit the
 * axis is set up in (G20 inches for an axis in in or thou, G21 millimetres otherwise).
 */
export class TestProgramQuery {
  @IsIn(['travel', 'positioning'], { message: 'kind must be travel or positioning' })
  kind: 'travel' | 'positioning';

  /** The unit of the values below. */
  @LengthUnitField()
  lengthUnit?: LengthUnit;

  /** Feed rate of the measuring moves, lengthUnit per minute. */
  @Optional()
  @Transform(toNumber)
  @IsNumber(FINITE, { message: 'feed must be a number (lengthUnit per minute)' })
  feed?: number;

  /** Travel trial: the commanded distances from the start ("100,250,500"). */
  @Optional()
  @Matches(/^\s*-?[\d.]+(\s*,\s*-?[\d.]+)*\s*$/, {
    message: 'distances must be comma-separated numbers (in lengthUnit)',
  })
  distances?: string;

  /** Repeat-and-reverse run: the targets ("10,212.5,405"). */
  @Optional()
  @Matches(/^\s*-?[\d.]+(\s*,\s*-?[\d.]+)*\s*$/, { message: 'targets must be comma-separated numbers (in lengthUnit)' })
  targets?: string;

  /** Where the travel trial starts, in `lengthUnit`. */
  @Optional()
  @Transform(toNumber)
  @IsNumber(FINITE, { message: 'start must be a number (in lengthUnit)' })
  start?: number;

  /** Count of runs in each direction (repeat-and-reverse run). */
  @Optional()
  @Transform(toNumber)
  @IsNumber(FINITE, { message: 'runs must be a whole number' })
  runs?: number;

  /** How far past a target the axis goes before approaching it, in `lengthUnit`. */
  @Optional()
  @Transform(toNumber)
  @IsNumber(FINITE, { message: 'overrun must be a number (in lengthUnit)' })
  overrun?: number;

  /** Dwell at each target for the reading, seconds (for controls with optional stop off). */
  @Optional()
  @Transform(toNumber)
  @IsNumber(FINITE, { message: 'dwell must be a number of seconds' })
  dwell?: number;

  /** G-code axis letter; from the axis name (Y1 → Y) when absent. */
  @Optional()
  @Matches(/^[XYZABCUVW]$/i, { message: 'letter must be one of X, Y, Z, A, B, C, U, V, W' })
  letter?: string;

  /** A line for the header; reduced to characters that cannot end a comment or start a block. */
  @Optional()
  @IsString({ message: 'notes must be text' })
  @MaxLength(200, { message: 'notes must be at most 200 characters' })
  notes?: string;

  @Optional()
  @IsIn(['nc', 'txt'], { message: 'format must be nc or txt' })
  format?: 'nc' | 'txt';
}

/** Query of GET /api/axes/:id/test-targets. */
export class TestTargetsQuery {
  /** The unit of `overrun` (mm when absent). */
  @LengthUnitField()
  lengthUnit?: LengthUnit;

  /** Clear travel kept beyond the first and last target, in `lengthUnit`. */
  @Optional()
  @Transform(toNumber)
  @IsNumber(FINITE, { message: 'overrun must be a number (in lengthUnit)' })
  overrun?: number;
}

import { Transform } from 'class-transformer';
import { IsIn, IsNumber, Matches } from 'class-validator';
import { Optional } from '../../common/optional.js';

const FINITE = { allowNaN: false, allowInfinity: false } as const;
const toNumber = ({ value }: { value: unknown }) => (value === undefined || value === '' ? undefined : Number(value));

/** Query of GET /api/axes/:id/test-program; lists are comma-separated mm values. */
export class TestProgramQuery {
  @IsIn(['travel', 'positioning'], { message: 'kind must be travel or positioning' })
  kind: 'travel' | 'positioning';

  /** Feed rate of the measuring moves, mm/min. */
  @Optional()
  @Transform(toNumber)
  @IsNumber(FINITE, { message: 'feed must be a number of mm/min' })
  feed?: number;

  /** Travel trial: the commanded distances from the start, mm ("100,250,500"). */
  @Optional()
  @Matches(/^\s*-?[\d.]+(\s*,\s*-?[\d.]+)*\s*$/, { message: 'distances must be comma-separated numbers of mm' })
  distances?: string;

  /** Repeat-and-reverse run: the targets, mm ("10,212.5,405"). */
  @Optional()
  @Matches(/^\s*-?[\d.]+(\s*,\s*-?[\d.]+)*\s*$/, { message: 'targets must be comma-separated numbers of mm' })
  targets?: string;

  /** Where the travel trial starts, mm. */
  @Optional()
  @Transform(toNumber)
  @IsNumber(FINITE, { message: 'start must be a number of mm' })
  start?: number;

  /** Runs in each direction (repeat-and-reverse run). */
  @Optional()
  @Transform(toNumber)
  @IsNumber(FINITE, { message: 'runs must be a whole number' })
  runs?: number;

  /** How far past a target the axis goes before approaching it, mm. */
  @Optional()
  @Transform(toNumber)
  @IsNumber(FINITE, { message: 'overrun must be a number of mm' })
  overrun?: number;

  /** Dwell at each target for the reading, seconds. */
  @Optional()
  @Transform(toNumber)
  @IsNumber(FINITE, { message: 'dwell must be a number of seconds' })
  dwell?: number;

  /** G-code axis letter; from the axis name (Y1 → Y) when absent. */
  @Optional()
  @Matches(/^[XYZABCUVW]$/i, { message: 'letter must be one of X, Y, Z, A, B, C, U, V, W' })
  letter?: string;

  @Optional()
  @IsIn(['nc', 'txt'], { message: 'format must be nc or txt' })
  format?: 'nc' | 'txt';
}

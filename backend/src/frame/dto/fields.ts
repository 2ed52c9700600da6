import { applyDecorators } from '@nestjs/common';
import { Equals, IsNumber, IsPositive, IsString, Max, MaxLength, Min, ValidateIf } from 'class-validator';
import { Optional } from '../../common/optional.js';
import { UNIT_FAMILY_HINT } from '../../common/unit-fields.js';

const FINITE = { allowNaN: false, allowInfinity: false };

/** A length that must be a finite number greater than zero, in the request's unit. */
export const PositiveLength = (field: string) =>
  applyDecorators(
    IsNumber(FINITE, { message: `${field} must be a number` }),
    IsPositive({ message: `${field} must be greater than zero` }),
    Max(1_000_000, { message: `${field} is too large` }),
  );

export const FiniteNumber = (field: string) =>
  applyDecorators(
    IsNumber(FINITE, { message: `${field} must be a number` }),
    Min(-1_000_000, { message: `${field} is too small` }),
    Max(1_000_000, { message: `${field} is too large` }),
  );

/**
 * The single `unit` of earlier requests meant every length here but only the heights in a bed
 * grid; it is refused with a message naming its replacements rather than the pipe's "should not exist".
 */
export const NoSingleUnit = () =>
  applyDecorators(
    ValidateIf((_: object, v: unknown) => v !== undefined),
    Equals(undefined, {
      message: `unit is no longer accepted: send lengthUnit and readingUnit instead (${UNIT_FAMILY_HINT})`,
    }),
  );

/** An optional length greater than zero (a resolution, a plate thickness), in the request's lengthUnit or readingUnit. */
export const OptionalPositive = (field: string) =>
  applyDecorators(
    Optional(),
    IsNumber(FINITE, { message: `${field} must be a number` }),
    IsPositive({ message: `${field} must be greater than zero` }),
    Max(1_000_000, { message: `${field} is too large` }),
  );

export const OptionalNote = () =>
  applyDecorators(
    Optional(),
    IsString({ message: 'note must be text' }),
    MaxLength(2000, { message: 'note must be at most 2000 characters' }),
  );

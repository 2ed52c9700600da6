import { applyDecorators } from '@nestjs/common';
import { IsIn, IsNumber, IsPositive, IsString, Max, MaxLength, Min } from 'class-validator';
import { LENGTH_UNITS } from '../../engine/units.js';
import { Optional } from '../../common/optional.js';

const FINITE = { allowNaN: false, allowInfinity: false };

/** A length that must be a finite number greater than zero, in the request's unit. */
export const PositiveLength = (field: string) =>
  applyDecorators(
    IsNumber(FINITE, { message: `${field} must be a number` }),
    IsPositive({ message: `${field} must be greater than zero` }),
    Max(1_000_000, { message: `${field} is too large` }),
  );

export const FiniteNumber = (field: string) =>
  applyDecorators(IsNumber(FINITE, { message: `${field} must be a number` }), Min(-1_000_000, { message: `${field} is too small` }), Max(1_000_000, { message: `${field} is too large` }));

export const OptionalUnit = () =>
  applyDecorators(Optional(), IsIn(LENGTH_UNITS, { message: `unit must be one of ${LENGTH_UNITS.join(', ')}` }));

export const OptionalNote = () =>
  applyDecorators(Optional(), IsString({ message: 'note must be text' }), MaxLength(2000, { message: 'note must be at most 2000 characters' }));

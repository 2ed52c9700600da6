import { applyDecorators } from '@nestjs/common';
import { ArrayMaxSize, IsArray, IsNumber } from 'class-validator';
import { MAX_POINTS } from '../../engine/validate.js';
import { Optional } from '../../common/optional.js';

const FINITE = { allowNaN: false, allowInfinity: false } as const;

/** A required finite number; range rules (positive, whole) are the engine's, with its messages. */
export const FiniteNumber = (field: string) => IsNumber(FINITE, { message: `${field} must be a finite number` });

export const OptionalFiniteNumber = (field: string) => applyDecorators(Optional(), FiniteNumber(field));

/** A list of finite numbers, at most MAX_POINTS long (minimum counts are checked by the engine). */
export const NumberList = (field: string) =>
  applyDecorators(
    IsArray({ message: `${field} must be a list of numbers` }),
    ArrayMaxSize(MAX_POINTS, {
      message: `${field} has more than ${MAX_POINTS} values; at most ${MAX_POINTS} are accepted`,
    }),
    IsNumber(FINITE, { each: true, message: `every value in ${field} must be a finite number` }),
  );

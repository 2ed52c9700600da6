import { applyDecorators } from '@nestjs/common';
import { IsNumber } from 'class-validator';
import { Optional } from '../../common/optional.js';

const FINITE = { allowNaN: false, allowInfinity: false } as const;

/** A finite number; the message names the field (range rules are the service's or the engine's). */
export const Finite = (field: string) => IsNumber(FINITE, { message: `${field} must be a finite number` });

export const OptionalFinite = (field: string) => applyDecorators(Optional(), Finite(field));

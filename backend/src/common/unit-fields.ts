import { IsIn } from 'class-validator';
import { applyDecorators } from '@nestjs/common';
import { ApiPropertyOptional } from '@nestjs/swagger';
import { LENGTH_UNITS } from '../engine/units.js';
import { Optional } from './optional.js';

/**
 * The two unit families every request, response and record names (both default to mm):
 * - lengthUnit: positions, geometry, commanded and measured moves, lead, pitch, diameters,
 *   lengths and travel (feed rates in lengthUnit per minute);
 * - readingUnit: indicator readings, deviations and bed heights.
 */
export const UNIT_FAMILY_HINT =
  'lengthUnit names the unit of positions, moves, lengths, lead and travel; readingUnit the unit of indicator readings, deviations and heights';

/** The names of the two lists in the API description: one schema each, which every unit field refers to. */
export const UNIT_ENUM_NAMES = { lengthUnit: 'LengthUnit', readingUnit: 'ReadingUnit' } as const;

function unitField(field: 'lengthUnit' | 'readingUnit') {
  return applyDecorators(
    ApiPropertyOptional({ enum: LENGTH_UNITS, enumName: UNIT_ENUM_NAMES[field] }),
    Optional(),
    IsIn(LENGTH_UNITS, { message: `${field} must be one of ${LENGTH_UNITS.join(', ')} (1 in = 25.4 mm exactly)` }),
  );
}

/** Optional `lengthUnit` (mm when absent). */
export const LengthUnitField = () => unitField('lengthUnit');
/** Optional `readingUnit` (mm when absent). */
export const ReadingUnitField = () => unitField('readingUnit');

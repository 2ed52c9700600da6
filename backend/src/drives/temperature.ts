import { BadRequestException } from '@nestjs/common';
import { toMm, type LengthUnit } from '../engine/units.js';
import type { ResultWarning } from '../engine/warnings.js';

/** The instrument's resolution in mm, or null; a step of zero or less cannot be read. */
export function resolutionMmOf(value: number | undefined | null, readingUnit: LengthUnit): number | null {
  if (value === undefined || value === null) return null;
  if (!(value > 0)) throw new BadRequestException(['instrumentResolution must be greater than zero (in readingUnit)']);
  return toMm(value, readingUnit);
}

/** One temperature without the other: nothing can be referred to 20 °C, and the record says so. */
export function temperatureWarnings(t: { machineTemperature?: number; scaleTemperature?: number }): ResultWarning[] {
  const machine = t.machineTemperature !== undefined && t.machineTemperature !== null;
  const scale = t.scaleTemperature !== undefined && t.scaleTemperature !== null;
  if (machine === scale) return [];
  return [
    {
      code: 'temperature-incomplete',
      message: `Only the ${machine ? 'machine' : 'scale'}'s temperature was recorded: the result is not referred to 20 °C. Record both the machine's and the scale's temperature to refer it.`,
    },
  ];
}

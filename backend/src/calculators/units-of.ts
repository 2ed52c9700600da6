import type { LengthUnit } from '../engine/units.js';

/** The two unit families of a request, mm when absent (the DTO has already checked their values). */
export interface UnitFamilies {
  lengthUnit: LengthUnit;
  readingUnit: LengthUnit;
}

export const unitsOf = (dto: { lengthUnit?: LengthUnit; readingUnit?: LengthUnit }): UnitFamilies => ({
  lengthUnit: dto.lengthUnit ?? 'mm',
  readingUnit: dto.readingUnit ?? 'mm',
});

import type { LengthUnit } from '../../engine/units.js';
import { NumberList, ReadingUnit } from './validators.js';

export class StraightnessDto {
  /** Stations along the rail, mm. */
  @NumberList('positions')
  positions: number[];

  /** Indicator readings in `unit`. */
  @NumberList('readings')
  readings: number[];

  @ReadingUnit()
  unit?: LengthUnit;
}

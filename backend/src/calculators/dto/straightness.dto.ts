import { NumberList } from './validators.js';
import { UnitFamiliesDto } from './unit-families.dto.js';

export class StraightnessDto extends UnitFamiliesDto {
  /** Stations along the rail, in `lengthUnit`. */
  @NumberList('positions')
  positions: number[];

  /** Indicator readings in `readingUnit`. */
  @NumberList('readings')
  readings: number[];
}

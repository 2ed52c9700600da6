import { NumberList } from './validators.js';
import { UnitFamiliesDto } from './unit-families.dto.js';
import { KeepsNumberListsPacked } from '../../common/keeps-number-lists-packed.js';

// The calculation hands its lists straight to the engine pool: large ones stay Float64Arrays.
@KeepsNumberListsPacked()
export class StraightnessDto extends UnitFamiliesDto {
  /** Stations along the rail, in `lengthUnit`. */
  @NumberList('positions')
  positions: number[];

  /** Indicator readings in `readingUnit`. */
  @NumberList('readings')
  readings: number[];
}

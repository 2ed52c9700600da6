import { NumberList } from './validators.js';
import { UnitFamiliesDto } from './unit-families.dto.js';
import { KeepsNumberListsPacked } from '../../common/keeps-number-lists-packed.js';

/** Stations in `lengthUnit`; both rails' readings, against one datum, in `readingUnit`. */
// The calculation hands its lists straight to the engine pool: large ones stay Float64Arrays.
@KeepsNumberListsPacked()
export class ParallelismDto extends UnitFamiliesDto {
  /** Station positions along the rails, in `lengthUnit`. */
  @NumberList('positions')
  positions: number[];

  /** Rail A's reading at each station, in `readingUnit`. */
  @NumberList('railA')
  railA: number[];

  /** Rail B's reading at each station, in `readingUnit`. */
  @NumberList('railB')
  railB: number[];
}

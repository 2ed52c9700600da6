import { NumberList } from './validators.js';
import { UnitFamiliesDto } from './unit-families.dto.js';

/** Stations in `lengthUnit`; both rails' readings, against one datum, in `readingUnit`. */
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

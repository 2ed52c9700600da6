import { NumberList } from './validators.js';
import { UnitFamiliesDto } from './unit-families.dto.js';

/** Stations in `lengthUnit`; both rails' readings, against one datum, in `readingUnit`. */
export class ParallelismDto extends UnitFamiliesDto {
  @NumberList('positions')
  positions: number[];

  @NumberList('railA')
  railA: number[];

  @NumberList('railB')
  railB: number[];
}

import type { LengthUnit } from '../../engine/units.js';
import { NumberList, ReadingUnit } from './validators.js';

export class ParallelismDto {
  @NumberList('positions')
  positions: number[];

  @NumberList('railA')
  railA: number[];

  @NumberList('railB')
  railB: number[];

  @ReadingUnit()
  unit?: LengthUnit;
}

import { Type } from 'class-transformer';
import { ArrayMaxSize, IsArray, IsIn, IsInt, IsObject, Min, ValidateNested } from 'class-validator';
import { TARGET_MODES, type TargetMode } from '../../engine/bolt-down.js';
import { MAX_POINTS } from '../../engine/validate.js';
import { FiniteNumber } from './validators.js';
import { UnitFamiliesDto } from './unit-families.dto.js';
import { Optional } from '../../common/optional.js';

export class HoleReadingDto {
  /** The hole from the rail's start, index from 0 (0 = first hole). */
  @IsInt({ message: 'hole must be a whole number' })
  @Min(0, { message: 'hole must not be negative' })
  hole: number;

  /** Reading at the hole once tightened, in `readingUnit`. */
  @FiniteNumber('reading')
  reading: number;
}

/** Rail length, hole pitch and first hole in `lengthUnit`; readings in `readingUnit`. */
export class BoltDownDto extends UnitFamiliesDto {
  /** Rail length, in lengthUnit. */
  @FiniteNumber('length')
  length: number;

  /** Hole pitch, in lengthUnit. */
  @FiniteNumber('pitch')
  pitch: number;

  /** First hole's centre from the rail's start, in lengthUnit. */
  @FiniteNumber('firstHoleOffset')
  firstHoleOffset: number;

  /** Aim at the first fixed hole's reading ("face") or at the line through fixed holes ("line", default). */
  @Optional()
  @IsIn(TARGET_MODES, { message: `mode must be one of ${TARGET_MODES.join(', ')}` })
  mode?: TargetMode;

  @Optional()
  @IsArray({ message: 'readings must be a list of {hole, reading}' })
  @ArrayMaxSize(MAX_POINTS, { message: `readings has more than ${MAX_POINTS} entries` })
  @IsObject({ each: true, message: 'every entry of readings must be {hole, reading}' })
  @ValidateNested({ each: true })
  @Type(() => HoleReadingDto)
  readings?: HoleReadingDto[];
}

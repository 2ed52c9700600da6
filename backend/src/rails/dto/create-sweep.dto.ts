import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsDateString,
  IsDefined,
  IsIn,
  IsNumber,
  IsString,
  IsUUID,
  Matches,
  Max,
  MaxLength,
  Min,
  ValidateNested,
} from 'class-validator';
import { SWEEP_FACES, SWEEP_PHASES, type SweepFace, type SweepPhase } from '../../database/schema/rails.js';
import { Optional } from '../../common/optional.js';
import { LengthUnitField, ReadingUnitField } from '../../common/unit-fields.js';
import type { LengthUnit } from '../../engine/units.js';
import { ReplacedUnitField } from './replaced-unit.js';
import { ApiHideProperty } from '@nestjs/swagger';

const FINITE = { allowNaN: false, allowInfinity: false } as const;
export const MAX_STATIONS = 2000;

export class StationDto {
  /** Where along the rail the reading was taken, in `lengthUnit`. */
  @IsNumber(FINITE, { message: 'position must be a number along the rail, in lengthUnit' })
  @Min(-1000000, { message: 'position must be within ±1 000 000 in lengthUnit' })
  @Max(1_000_000, { message: 'position must be within ±1 000 000 in lengthUnit' })
  position: number;

  /** The indicator's reading at that station, in `readingUnit`. */
  @IsNumber(FINITE, { message: 'reading must be a number in readingUnit' })
  @Min(-1000000, { message: 'reading must be within ±1 000 000 in readingUnit' })
  @Max(1_000_000, { message: 'reading must be within ±1 000 000 in readingUnit' })
  reading: number;
}

export class CreateSweepDto {
  @Optional()
  @IsUUID('all', { message: 'id must be a uuid made by the client' })
  id?: string;

  /** Unit of the readings and of the instrument resolution. */
  @ReadingUnitField()
  readingUnit?: LengthUnit;

  /** Unit of the station positions. */
  @LengthUnitField()
  lengthUnit?: LengthUnit;

  @ReplacedUnitField()
  @ApiHideProperty() // refused when sent, so not part of the described request
  unit?: never;

  /** The face the indicator reads: side (sideways straightness) or top (heights); side when absent. */
  @Optional()
  @IsIn(SWEEP_FACES, { message: `face must be one of ${SWEEP_FACES.join(', ')}: the rail face the indicator reads` })
  face?: SweepFace;

  @IsDefined({ message: 'stations is required: a list of {position, reading}' })
  @IsArray({ message: 'stations must be a list of {position, reading}' })
  @ArrayMinSize(3, { message: 'stations needs at least 3 readings for a straightness' })
  @ArrayMaxSize(MAX_STATIONS, { message: `stations has more than ${MAX_STATIONS} readings` })
  @ValidateNested({ each: true })
  @Type(() => StationDto)
  stations: StationDto[];

  @Optional()
  @IsString({ message: 'instrument must be text' })
  @MaxLength(120, { message: 'instrument must be at most 120 characters' })
  instrument?: string;

  /** Smallest step of the instrument, in `readingUnit`. */
  @Optional()
  @IsNumber(FINITE, { message: 'resolution must be a number in readingUnit' })
  @Min(0, { message: 'resolution must not be negative' })
  resolution?: number;

  /** Air temperature while the sweep was taken, °C. */
  @Optional()
  @IsNumber(FINITE, { message: 'temperatureC must be a number of °C' })
  @Min(-40, { message: 'temperatureC must be at least -40 °C' })
  @Max(80, { message: 'temperatureC must be at most 80 °C' })
  temperatureC?: number;

  @IsIn(SWEEP_PHASES, { message: `phase must be one of ${SWEEP_PHASES.join(', ')}` })
  phase: SweepPhase;

  @Optional()
  @IsString({ message: 'takenBy must be text' })
  @MaxLength(120, { message: 'takenBy must be at most 120 characters' })
  takenBy?: string;

  @Optional()
  @IsString({ message: 'boltSize must be text such as M5' })
  @Matches(/^M\d{1,2}(\.\d)?$/, { message: 'boltSize must be a metric bolt size such as M4, M5, M6 or M8' })
  boltSize?: string;

  @Optional()
  @IsNumber(FINITE, { message: 'torqueNm must be a number of N·m' })
  @Min(0, { message: 'torqueNm must not be negative' })
  @Max(500, { message: 'torqueNm must be at most 500 N·m' })
  torqueNm?: number;

  @Optional()
  @IsString({ message: 'datum must be text naming the common datum' })
  @MaxLength(120, { message: 'datum must be at most 120 characters' })
  datum?: string;

  @Optional()
  @IsString({ message: 'notes must be text' })
  @MaxLength(5000, { message: 'notes must be at most 5000 characters' })
  notes?: string;

  /** When the readings were taken, if not now (a notebook entered later). */
  @Optional()
  @IsDateString({}, { message: 'takenAt must be a date and time (ISO 8601)' })
  takenAt?: string;
}

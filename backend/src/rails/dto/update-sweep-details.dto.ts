import { Transform } from 'class-transformer';
import { IsNumber, IsString, Matches, Max, MaxLength, Min, ValidateIf } from 'class-validator';
import { Optional } from '../../common/optional.js';

const FINITE = { allowNaN: false, allowInfinity: false } as const;
const trim = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value);
/** null clears a field that may be empty; absent leaves it as it is. */
const Clearable = () => ValidateIf((_: object, v: unknown) => v !== null && v !== undefined);

/**
 * A correction of a sweep's details, every field optional (the recording's details as in
 * CreateSweepDto, without its readings, units, face, phase or time, which make the result).
 * Absent fields stay as they are; null clears a field that may be empty.
 */
export class UpdateSweepDetailsDto {
  @Optional()
  @Transform(trim)
  @IsString({ message: 'instrument must be text' })
  @MaxLength(120, { message: 'instrument must be at most 120 characters' })
  instrument?: string;

  @Clearable()
  @IsNumber(FINITE, { message: 'temperatureC must be a number of °C, or null to clear it' })
  @Min(-40, { message: 'temperatureC must be at least -40 °C' })
  @Max(80, { message: 'temperatureC must be at most 80 °C' })
  temperatureC?: number | null;

  @Optional()
  @Transform(trim)
  @IsString({ message: 'takenBy must be text' })
  @Matches(/\S/, { message: 'takenBy must name who took the sweep' })
  @MaxLength(120, { message: 'takenBy must be at most 120 characters' })
  takenBy?: string;

  @Clearable()
  @IsString({ message: 'boltSize must be text such as M5, or null to clear it' })
  @Matches(/^M\d{1,2}(\.\d)?$/, { message: 'boltSize must be a metric bolt size such as M4, M5, M6 or M8' })
  boltSize?: string | null;

  @Clearable()
  @IsNumber(FINITE, { message: 'torqueNm must be a number of N·m, or null to clear it' })
  @Min(0, { message: 'torqueNm must not be negative' })
  @Max(500, { message: 'torqueNm must be at most 500 N·m' })
  torqueNm?: number | null;

  @Clearable()
  @Transform(trim)
  @IsString({ message: 'datum must be text naming the common datum, or null to clear it' })
  @MaxLength(120, { message: 'datum must be at most 120 characters' })
  datum?: string | null;

  @Optional()
  @IsString({ message: 'notes must be text' })
  @MaxLength(5000, { message: 'notes must be at most 5000 characters' })
  notes?: string;
}

import type { Type } from '@nestjs/common';
import { PartialType, PickType } from '@nestjs/swagger'; // carry the rules and the API description
import { Transform } from 'class-transformer';
import { IsString, Matches, MaxLength, ValidateIf } from 'class-validator';
import { CreateSweepDto } from './create-sweep.dto.js';

const trim = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value);
/** null clears a field that may be empty; absent leaves it as it is. */
const Clearable = () => ValidateIf((_: object, v: unknown) => v !== null && v !== undefined);

const DETAILS = ['instrument', 'temperatureC', 'takenBy', 'boltSize', 'torqueNm', 'datum', 'notes'] as const;
type Details = Pick<CreateSweepDto, (typeof DETAILS)[number]>;
// Typed so that the clearable fields below may be null.
const Base: Type<{ [K in keyof Details]?: Details[K] | null }> = PartialType(PickType(CreateSweepDto, DETAILS), {
  skipNullProperties: false,
});

/**
 * A correction of a sweep's details, every field optional: the recording's details as in
 * CreateSweepDto (their rules and messages), without its readings, units, face, phase or time,
 * which make the result. Absent fields stay as they are; null clears temperatureC, boltSize,
 * torqueNm and datum. A property redeclared here keeps the create DTO's rules unless it declares
 * rules of its own (class-validator then takes only these), as takenBy does.
 */
export class UpdateSweepDetailsDto extends Base {
  @Transform(trim)
  instrument?: string;

  /** Air temperature while the sweep was taken, °C; null clears it. */
  @Clearable()
  temperatureC?: number | null;

  @Transform(trim)
  @IsString({ message: 'takenBy must be text' })
  @Matches(/\S/, { message: 'takenBy must name who took the sweep' })
  @MaxLength(120, { message: 'takenBy must be at most 120 characters' })
  takenBy?: string;

  @Clearable()
  boltSize?: string | null;

  @Clearable()
  torqueNm?: number | null;

  @Clearable()
  @Transform(trim)
  datum?: string | null;
}

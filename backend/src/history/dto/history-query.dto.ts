import { Type } from 'class-transformer';
import { IsISO8601, IsInt, IsString, Matches, Max, MaxLength, Min } from 'class-validator';
import { Optional } from '../../common/optional.js';

/** The filters and page of a history list; every one optional. */
export class HistoryQueryDto {
  @Optional()
  @IsString({ message: 'kind must be text' })
  @Matches(/^[a-z-]{1,40}$/, { message: 'kind must be a record kind such as rail-sweep or person' })
  kind?: string;

  @Optional()
  @IsString({ message: 'person must be text' })
  @MaxLength(120, { message: 'person must be at most 120 characters' })
  person?: string;

  @Optional()
  @IsISO8601(
    { strict: true },
    { message: 'from must be a date or date and time (ISO 8601), e.g. 2026-03-01 or 2026-03-01T00:00:00+01:00' },
  )
  from?: string;

  @Optional()
  @IsISO8601(
    { strict: true },
    { message: 'to must be a date or date and time (ISO 8601), e.g. 2026-03-31 or 2026-03-31T23:59:59+01:00' },
  )
  to?: string;

  @Optional()
  @IsString({ message: 'cursor must be the nextCursor of an earlier page' })
  @Matches(/^[A-Za-z0-9_-]{1,200}$/, { message: 'cursor must be the nextCursor of an earlier page' })
  cursor?: string;

  /** Count of entries to answer with (1 to 200). */
  @Optional()
  @Type(() => Number)
  @IsInt({ message: 'limit must be a whole number' })
  @Min(1, { message: 'limit must be at least 1' })
  @Max(200, { message: 'limit must be at most 200' })
  limit?: number;
}

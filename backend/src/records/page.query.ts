import { Type } from 'class-transformer';
import { IsInt, IsUUID, Max, Min } from 'class-validator';
import { Optional } from '../common/optional.js';

/**
 * One page of a list of records (a rail's sweeps, an axis's trials or runs): `limit` of them
 * (default 50), after the page `cursor` ended. See page-cursor.ts.
 */
export class PageQuery {
  /** Count of records on the page (1 to 200; 50 when absent). */
  @Optional()
  @Type(() => Number)
  @IsInt({ message: 'limit must be a whole number' })
  @Min(1, { message: 'limit must be at least 1' })
  @Max(200, { message: 'limit must be at most 200' })
  limit?: number;

  /** The id of the last record of the page before (the X-Next-Cursor it came with). */
  @Optional()
  @IsUUID('all', { message: 'cursor must be the X-Next-Cursor of an earlier page (a record id)' })
  cursor?: string;
}

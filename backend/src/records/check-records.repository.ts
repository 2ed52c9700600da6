import { Inject, Injectable } from '@nestjs/common';
import { DRIZZLE, type Database } from '../database/database.tokens.js';
import { CHECK_RECORD_TABLES, type CheckRecordTable, type CheckRecordType } from './check-record-tables.js';
import { CheckRecords } from './check-records.js';

/** The repository of one record type's checks. */
export type CheckRecordsOf<K extends CheckRecordType> = CheckRecords<CheckRecordTable<K>>;

/** The check records of every table in CHECK_RECORD_TABLES, one `CheckRecords` per record type. */
@Injectable()
export class CheckRecordsRepository {
  private readonly made = new Map<CheckRecordType, CheckRecords<never>>();

  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  of<K extends CheckRecordType>(type: K): CheckRecordsOf<K> {
    let records = this.made.get(type);
    if (!records) {
      records = new CheckRecords(this.db, CHECK_RECORD_TABLES[type] as never);
      this.made.set(type, records);
    }
    return records as unknown as CheckRecordsOf<K>;
  }
}

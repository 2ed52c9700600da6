import { IsBoolean, IsNumber, IsUUID } from 'class-validator';

export class RecordHoleDto {
  /** Indicator reading at the hole, in the bolt-down's `readingUnit`. */
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: "reading must be a number in the bolt-down's unit" })
  reading: number;

  /** true: the hole is tightened at this reading; false: typed but not tightened, or loosened again. */
  @IsBoolean({ message: 'fixed must be true or false' })
  fixed: boolean;

  /** Made by the browser for this write; sending it again is the same write. */
  @IsUUID('all', { message: 'writeId must be a uuid made by the browser for this write' })
  writeId: string;
}

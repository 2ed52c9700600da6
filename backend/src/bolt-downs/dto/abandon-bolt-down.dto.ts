import { Transform } from 'class-transformer';
import { IsString, MaxLength, MinLength } from 'class-validator';

export class AbandonBoltDownDto {
  /** Why the bolt-down is given up (a rail re-seated, a bad reference face): kept with it and in the history. */
  @Transform(({ value }) => (typeof value === 'string' ? value.trim() : value))
  @IsString({ message: 'reason must be text saying why the bolt-down is abandoned' })
  @MinLength(3, { message: 'reason must say why the bolt-down is abandoned, in at least 3 characters' })
  @MaxLength(1000, { message: 'reason must be at most 1000 characters' })
  reason: string;
}

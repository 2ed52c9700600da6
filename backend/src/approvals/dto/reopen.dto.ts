import { IsString, MaxLength, MinLength } from 'class-validator';
import { Transform } from 'class-transformer';

export class ReopenDto {
  @Transform(({ value }) => (typeof value === 'string' ? value.trim() : value))
  @IsString({ message: 'reason must be text' })
  @MinLength(10, { message: 'reason must say why the machine is reopened, in at least 10 characters' })
  @MaxLength(2000, { message: 'reason must be at most 2000 characters' })
  reason: string;
}

import { IsString, MaxLength, MinLength } from 'class-validator';
import { Transform } from 'class-transformer';

export class ApproveDto {
  @IsString({ message: 'password must be your password, re-entered to sign' })
  @MinLength(1, { message: 'password is required to sign the approval' })
  @MaxLength(200, { message: 'password must be at most 200 characters' })
  password: string;

  @Transform(({ value }) => (typeof value === 'string' ? value.trim() : value))
  @IsString({ message: 'statement must be text' })
  @MinLength(20, { message: 'statement must be at least 20 characters' })
  @MaxLength(4000, { message: 'statement must be at most 4000 characters' })
  statement: string;
}

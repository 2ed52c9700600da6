import { IsString, Matches, MaxLength, MinLength } from 'class-validator';

export class PasswordResetDto {
  @IsString({ message: 'token must be a string' })
  @Matches(/^[A-Za-z0-9_-]{20,100}$/, { message: 'token must be the code from the e-mailed link' })
  token: string;

  @IsString({ message: 'password must be a string' })
  @MinLength(12, { message: 'password must be at least 12 characters' })
  @MaxLength(200, { message: 'password must be at most 200 characters' })
  password: string;
}

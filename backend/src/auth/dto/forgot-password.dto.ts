import { IsEmail, MaxLength } from 'class-validator';

export class ForgotPasswordDto {
  @IsEmail({}, { message: 'email must be an e-mail address' })
  @MaxLength(254, { message: 'email must be at most 254 characters' })
  email: string;
}

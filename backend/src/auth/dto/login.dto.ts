import { IsString, MaxLength, MinLength } from 'class-validator';

export class LoginDto {
  @IsString({ message: 'email must be a string' })
  @MinLength(1, { message: 'email is required' })
  @MaxLength(254)
  email: string;

  @IsString({ message: 'password must be a string' })
  @MinLength(1, { message: 'password is required' })
  @MaxLength(200)
  password: string;
}

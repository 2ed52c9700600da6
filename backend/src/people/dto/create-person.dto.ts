import { IsEmail, IsIn, IsString, MaxLength, MinLength } from 'class-validator';
import { ROLES, type Role } from '../../database/schema/users.js';

export class CreatePersonDto {
  @IsString()
  @MinLength(1, { message: 'name is required' })
  @MaxLength(120)
  name: string;

  @IsEmail({}, { message: 'email must be an e-mail address' })
  @MaxLength(254)
  email: string;

  @IsIn(ROLES, { message: `role must be one of ${ROLES.join(', ')}` })
  role: Role;
}

import { IsBoolean, IsIn, IsOptional } from 'class-validator';
import { ROLES, type Role } from '../../database/schema/users.js';

export class UpdatePersonDto {
  @IsOptional()
  @IsIn(ROLES, { message: `role must be one of ${ROLES.join(', ')}` })
  role?: Role;

  @IsOptional()
  @IsBoolean({ message: 'active must be true or false' })
  active?: boolean;
}

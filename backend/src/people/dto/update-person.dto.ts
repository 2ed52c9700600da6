import { IsBoolean, IsIn } from 'class-validator';
import { ROLES, type Role } from '../../database/schema/users.js';
import { Optional } from '../../common/optional.js';

export class UpdatePersonDto {
  @Optional()
  @IsIn(ROLES, { message: `role must be one of ${ROLES.join(', ')}` })
  role?: Role;

  @Optional()
  @IsBoolean({ message: 'active must be true or false' })
  active?: boolean;
}

import { createParamDecorator, ExecutionContext, SetMetadata } from '@nestjs/common';
import type { Role } from '../database/schema/users.js';
import type { SessionUser } from './session-user.js';

export const IS_PUBLIC = 'railwright:public';
export const ROLES_KEY = 'railwright:roles';

/** Opens a route to anonymous callers; every other route needs a session. */
export const Public = () => SetMetadata(IS_PUBLIC, true);

/** Limits a route to the listed roles; without it any signed-in role may call it. */
export const Roles = (...roles: Role[]) => SetMetadata(ROLES_KEY, roles);

/** Roles that may change records (everyone but viewers). */
export const RECORDERS: Role[] = ['admin', 'owner', 'technician', 'builder'];

export const CurrentUser = createParamDecorator(
  (_data: unknown, ctx: ExecutionContext): SessionUser => ctx.switchToHttp().getRequest().user,
);

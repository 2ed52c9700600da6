import { CanActivate, ExecutionContext, ForbiddenException, Injectable, UnauthorizedException } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import type { Role } from '../database/schema/users.js';
import { IS_PUBLIC, ROLES_KEY } from './decorators.js';
import { AuthRepository } from './auth.repository.js';

/**
 * The one global guard: a session is needed unless the route is public, the user must still be
 * active, and the route's roles (if any) must include the user's.
 */
@Injectable()
export class SessionAuthGuard implements CanActivate {
  constructor(
    private readonly reflector: Reflector,
    private readonly users: AuthRepository,
  ) {}

  async canActivate(ctx: ExecutionContext): Promise<boolean> {
    const targets = [ctx.getHandler(), ctx.getClass()];
    if (this.reflector.getAllAndOverride<boolean>(IS_PUBLIC, targets)) return true;
    const req = ctx.switchToHttp().getRequest();
    const userId: string | undefined = req.session?.get?.('userId');
    const user = userId ? await this.users.findSessionUser(userId) : null;
    if (!user) throw new UnauthorizedException('Sign in to continue');
    req.user = user;
    const roles = this.reflector.getAllAndOverride<Role[] | undefined>(ROLES_KEY, targets);
    if (roles && !roles.includes(user.role)) {
      throw new ForbiddenException(`This needs the role ${roles.join(' or ')}; you are signed in as ${user.role}`);
    }
    return true;
  }
}

import { CanActivate, ExecutionContext, ForbiddenException, Injectable, UnauthorizedException } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import type { Role } from '../database/schema/users.js';
import { IS_PUBLIC, ROLES_KEY } from './decorators.js';
import { AuthRepository } from './auth.repository.js';
import { LOADED_USER, type LoadedSessionUser } from '../database/session-store.js';
import type { SessionUser } from './session-user.js';

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
    const found = userId ? await this.sessionUser(req.session, userId) : null;
    if (!found) throw new UnauthorizedException('Sign in to continue');
    // A session signed in before the password changed or the person was deactivated stays dead,
    // even if a request still in flight wrote it back to the store.
    const signedInAt: unknown = req.session.get('createdAt');
    if (typeof signedInAt === 'number' && signedInAt < found.sessionsValidFrom.getTime()) {
      await req.session.destroy();
      throw new UnauthorizedException(
        'Your session has ended (your password was changed or your account was deactivated). Sign in again.',
      );
    }
    const { sessionsValidFrom: _omit, ...user } = found;
    req.user = user;
    const roles = this.reflector.getAllAndOverride<Role[] | undefined>(ROLES_KEY, targets);
    if (roles && !roles.includes(user.role)) {
      throw new ForbiddenException(`This needs the role ${roles.join(' or ')}; you are signed in as ${user.role}`);
    }
    return true;
  }

  /**
   * The person the session store read with the session (one statement for both); asked apart only
   * when the session was not read from the store in this request.
   */
  private async sessionUser(
    session: { get(key: string): unknown },
    userId: string,
  ): Promise<(SessionUser & { sessionsValidFrom: Date }) | null> {
    const loaded = session.get(LOADED_USER) as LoadedSessionUser | false | undefined;
    if (loaded === false) return null;
    if (loaded && loaded.id === userId) {
      const { sessionsValidFrom, ...user } = loaded;
      return { ...user, sessionsValidFrom: new Date(sessionsValidFrom) };
    }
    return this.users.findSessionUser(userId);
  }
}

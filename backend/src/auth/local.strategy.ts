import { Injectable, UnauthorizedException } from '@nestjs/common';
import { PassportStrategy } from '@nestjs/passport';
import { Strategy } from 'passport-local';
import { AuthService } from './auth.service.js';
import { SignInThrottle } from './login-throttle.js';
import type { SessionUser } from './session-user.js';

/** Runs after LoginBodyGuard has counted the attempt; a right password takes the count back. */
@Injectable()
export class LocalStrategy extends PassportStrategy(Strategy) {
  constructor(
    private readonly auth: AuthService,
    private readonly throttle: SignInThrottle,
  ) {
    super({ usernameField: 'email', passReqToCallback: true });
  }

  async validate(req: { ip: string }, email: string, password: string): Promise<SessionUser> {
    const user = await this.auth.checkCredentials(req.ip, email, password);
    if (!user) throw new UnauthorizedException('That e-mail and password do not match an active account');
    await this.throttle.succeed(email, req.ip);
    return user;
  }
}

import { Injectable, UnauthorizedException } from '@nestjs/common';
import { PassportStrategy } from '@nestjs/passport';
import { Strategy } from 'passport-local';
import { AuthService } from './auth.service.js';
import type { SessionUser } from './session-user.js';

@Injectable()
export class LocalStrategy extends PassportStrategy(Strategy) {
  constructor(private readonly auth: AuthService) {
    super({ usernameField: 'email', passReqToCallback: true });
  }

  async validate(req: { ip: string }, email: string, password: string): Promise<SessionUser> {
    const user = await this.auth.checkCredentials(req.ip, email, password);
    if (!user) throw new UnauthorizedException('That e-mail and password do not match an active account');
    return user;
  }
}

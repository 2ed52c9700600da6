import { Injectable } from '@nestjs/common';
import { AuthRepository } from './auth.repository.js';
import { LoginThrottle } from './login-throttle.js';
import { verifyPassword } from './password.js';
import type { SessionUser } from './session-user.js';

// Compared against when the e-mail is unknown, so both failures take the same time.
const DUMMY_HASH =
  'scrypt$32768$8$1$AAAAAAAAAAAAAAAAAAAAAA==$AAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAA=';

@Injectable()
export class AuthService {
  constructor(
    private readonly repo: AuthRepository,
    private readonly throttle: LoginThrottle,
  ) {}

  async checkCredentials(address: string, email: string, password: string): Promise<SessionUser | null> {
    const found = await this.repo.findActiveByEmail(email);
    const ok = await verifyPassword(password, found?.passwordHash ?? DUMMY_HASH);
    if (!found || !ok) {
      this.throttle.recordFailure(address, email);
      return null;
    }
    this.throttle.recordSuccess(address, email);
    const { passwordHash: _omit, ...user } = found;
    return user;
  }

  /** Re-entered password, used where a signature is needed (approval). */
  async confirmPassword(userId: string, password: string): Promise<boolean> {
    const hash = await this.repo.findPasswordHash(userId);
    return hash ? verifyPassword(password, hash) : false;
  }
}

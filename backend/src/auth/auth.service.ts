import { SessionCache } from '../database/session-cache.js';
import { Injectable } from '@nestjs/common';
import { TransactionContext } from '../database/transaction-context.js';
import { RecordsService } from '../records/records.service.js';
import { AuthRepository } from './auth.repository.js';
import { SignInThrottle } from './login-throttle.js';
import { verifyPassword } from './password.js';
import type { SessionUser } from './session-user.js';

// Compared against when the e-mail is unknown, so both failures take the same time.
const DUMMY_HASH = 'scrypt$32768$8$1$AAAAAAAAAAAAAAAAAAAAAA==$AAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAA=';

@Injectable()
export class AuthService {
  constructor(
    private readonly repo: AuthRepository,
    private readonly throttle: SignInThrottle,
    private readonly records: RecordsService,
    private readonly transactions: TransactionContext,
    private readonly sessions: SessionCache,
  ) {}

  async checkCredentials(address: string, email: string, password: string): Promise<SessionUser | null> {
    const found = await this.repo.findActiveByEmail(email);
    const ok = await verifyPassword(password, found?.passwordHash ?? DUMMY_HASH);
    // Attempts are counted by the sign-in guard and strategy (SignInThrottle), before this runs.
    if (!found || !ok) {
      await this.auditFailedSignIn(address, email);
      return null;
    }
    const { passwordHash: _omit, ...user } = found;
    await this.kept(() =>
      this.records.audit(user, {
        recordType: 'sign-in',
        recordId: user.id,
        action: 'signed-in',
        summary: `${user.name} signed in`,
      }),
    );
    return user;
  }

  /**
   * Re-entered password, used where a signature is needed (approval). Throttled like sign-in
   * (429 past the limit), per person: the count is kept outside the command's transaction,
   * because a wrong password answers 403 and rolls the command back.
   */
  async confirmPassword(userId: string, password: string): Promise<boolean> {
    const key = `signing:${userId}`;
    await this.transactions.outside(() => this.throttle.check(key, key));
    const hash = await this.repo.findPasswordHash(userId);
    const ok = hash ? await verifyPassword(password, hash) : false;
    if (ok) await this.transactions.outside(() => this.throttle.succeed(key, key));
    return ok;
  }

  /** Signs the person out everywhere: on a password change, a reset and a deactivation. */
  async endSessions(userId: string): Promise<void> {
    await this.repo.endSessions(userId, new Date());
    this.personChanged(userId);
  }

  /**
   * The person's sessions are read afresh once the command commits, so a new role, a deactivation
   * or ended sessions count from the very next request here (other servers hear it from the database).
   */
  personChanged(userId: string): void {
    this.transactions.afterCommit(() => this.sessions.forgetPerson(userId));
  }

  /** A failed sign-in to an existing account is kept in that account's workshop history. */
  private async auditFailedSignIn(address: string, email: string): Promise<void> {
    const account = await this.repo.findAccountByEmail(email);
    if (!account) return;
    const why = account.active ? 'wrong password' : 'the account is deactivated';
    await this.kept(() =>
      this.records.audit(
        { id: null, name: `Unknown (from address ${address})`, workshopId: account.workshopId },
        {
          recordType: 'sign-in',
          recordId: account.id,
          action: 'sign-in-failed',
          summary: `Failed sign-in to ${account.name}'s account (${why})`,
        },
      ),
    );
  }

  /** Written on the pool, outside any command: a refused sign-in answers 401 and must keep its entry. */
  private kept(work: () => Promise<void>): Promise<void> {
    return this.transactions.outside(work);
  }
}

import { HttpException, HttpStatus, Injectable, Logger } from '@nestjs/common';
import { SignInAttemptsRepository, type AttemptPolicy } from './sign-in-attempts.repository.js';

/** Per account: five tries, then a wait from 30 s doubling up to 15 minutes (ASVS 2.2.1: well under 100 failures an hour). */
export const ACCOUNT_POLICY: AttemptPolicy = {
  free: 5,
  firstDelaySeconds: 30,
  maxDelaySeconds: 15 * 60,
  quietResetSeconds: 3600,
};
/**
 * Per address: many people may sign in from behind one address (a workshop's router), so the
 * address only slows down — 30 tries, then a wait from 2 s doubling up to 30 s — and never
 * locks out the others behind it.
 */
export const ADDRESS_POLICY: AttemptPolicy = {
  free: 30,
  firstDelaySeconds: 2,
  maxDelaySeconds: 30,
  quietResetSeconds: 3600,
};

const PRUNE_EVERY = 200;

export class SignInThrottled extends HttpException {
  constructor(readonly retryAfterSeconds: number) {
    const wait =
      retryAfterSeconds >= 60 ? `${Math.ceil(retryAfterSeconds / 60)} minutes` : `${retryAfterSeconds} seconds`;
    super(
      { statusCode: 429, message: `Too many failed sign-ins. Try again in ${wait}.`, retryAfterSeconds },
      HttpStatus.TOO_MANY_REQUESTS,
    );
  }
}

export const accountKey = (email: string) => `account:${email.trim().toLowerCase()}`;
export const addressKey = (address: string) => `address:${address}`;

/**
 * Sign-in throttling shared by every instance (counted in PostgreSQL). `check` counts the attempt
 * before any password is compared, so parallel attempts cannot slip past the count; `succeed`
 * takes the count back for a right password. A failure needs no further call: it was counted.
 * Also meant for any other place a password is re-entered (the approval signature).
 */
@Injectable()
export class SignInThrottle {
  private readonly logger = new Logger('SignInThrottle');
  private checks = 0;

  constructor(private readonly attempts: SignInAttemptsRepository) {}

  /** Counts one attempt for the account and the address; throws SignInThrottled (429) when either must wait. */
  async check(email: string, address: string): Promise<void> {
    if (++this.checks % PRUNE_EVERY === 0) {
      this.attempts.prune(ACCOUNT_POLICY.quietResetSeconds).catch((err) => this.logger.warn(`prune failed: ${err}`));
    }
    const addressWait = await this.attempts.charge(addressKey(address), ADDRESS_POLICY);
    if (addressWait !== null) throw new SignInThrottled(addressWait);
    const accountWait = await this.attempts.charge(accountKey(email), ACCOUNT_POLICY);
    if (accountWait !== null) {
      // Not evaluated, so not held against the others behind this address.
      await this.attempts.refund(addressKey(address));
      throw new SignInThrottled(accountWait);
    }
  }

  /** The password was right: the account starts again from zero and the address gets its try back. */
  async succeed(email: string, address: string): Promise<void> {
    await Promise.all([this.attempts.clear(accountKey(email)), this.attempts.refund(addressKey(address))]);
  }
}

import { ACCOUNT_POLICY, ADDRESS_POLICY, SignInThrottle, SignInThrottled } from './login-throttle.js';
import type { AttemptPolicy, SignInAttemptsRepository } from './sign-in-attempts.repository.js';

/** The counting itself is PostgreSQL's (see test/security-sign-in.e2e-spec.ts); this checks the order of the calls. */
class FakeAttempts {
  calls: string[] = [];
  waits = new Map<string, number>();
  async charge(key: string, _policy: AttemptPolicy) {
    this.calls.push(`charge ${key}`);
    return this.waits.get(key) ?? null;
  }
  async refund(key: string) {
    this.calls.push(`refund ${key}`);
  }
  async clear(key: string) {
    this.calls.push(`clear ${key}`);
  }
  async prune() {}
}

describe('SignInThrottle', () => {
  const make = () => {
    const fake = new FakeAttempts();
    return { fake, throttle: new SignInThrottle(fake as unknown as SignInAttemptsRepository) };
  };

  it('counts the address, then the account (e-mail in lower case)', async () => {
    const { fake, throttle } = make();
    await throttle.check(' A@Example.com ', '10.0.0.1');
    expect(fake.calls).toEqual(['charge address:10.0.0.1', 'charge account:a@example.com']);
  });

  it('a waiting address is refused before the account is counted', async () => {
    const { fake, throttle } = make();
    fake.waits.set('address:10.0.0.1', 8);
    await expect(throttle.check('a@example.com', '10.0.0.1')).rejects.toMatchObject({ retryAfterSeconds: 8 });
    expect(fake.calls).toEqual(['charge address:10.0.0.1']);
  });

  it('a waiting account gives the address its try back', async () => {
    const { fake, throttle } = make();
    fake.waits.set('account:a@example.com', 120);
    const err = await throttle.check('a@example.com', '10.0.0.1').catch((e) => e);
    expect(err).toBeInstanceOf(SignInThrottled);
    expect(err.getStatus()).toBe(429);
    expect(err.getResponse().message).toBe('Too many failed sign-ins. Try again in 2 minutes.');
    expect(fake.calls.at(-1)).toBe('refund address:10.0.0.1');
  });

  it('the address waits at most 30 s, so others behind it get in within a bounded delay; accounts allow under 100 failures an hour', () => {
    expect(ADDRESS_POLICY.maxDelaySeconds).toBeLessThanOrEqual(30);
    // ASVS 4.0 2.2.1: no more than 100 failed attempts per hour on one account.
    let t = 0;
    let n = 0;
    while (t < 3600) {
      n++;
      t +=
        n < ACCOUNT_POLICY.free
          ? 0
          : Math.min(ACCOUNT_POLICY.maxDelaySeconds, ACCOUNT_POLICY.firstDelaySeconds * 2 ** (n - ACCOUNT_POLICY.free));
    }
    expect(n).toBeLessThan(100);
  });
});

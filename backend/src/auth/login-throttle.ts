import { HttpException, HttpStatus, Injectable } from '@nestjs/common';

const WINDOW_MS = 15 * 60 * 1000;
const MAX_FAILURES_PER_ACCOUNT = 5;
const MAX_FAILURES_PER_ADDRESS = 50;

interface Counter {
  failures: number;
  windowStart: number;
}

/**
 * Counts failed sign-ins per (address, e-mail) and per address; past the limit further attempts
 * are refused with 429 until the window ends, whether or not the password would be right.
 */
@Injectable()
export class LoginThrottle {
  private readonly counters = new Map<string, Counter>();

  constructor(private readonly now: () => number = Date.now) {}

  assertAllowed(address: string, email: string): void {
    const retryAfter = Math.max(
      this.blockedFor(`acct:${address}|${email.toLowerCase()}`, MAX_FAILURES_PER_ACCOUNT),
      this.blockedFor(`addr:${address}`, MAX_FAILURES_PER_ADDRESS),
    );
    if (retryAfter > 0) {
      const minutes = Math.ceil(retryAfter / 60000);
      throw new HttpException(
        { statusCode: 429, message: `Too many failed sign-ins. Try again in ${minutes} minute${minutes === 1 ? '' : 's'}.`, retryAfterSeconds: Math.ceil(retryAfter / 1000) },
        HttpStatus.TOO_MANY_REQUESTS,
      );
    }
  }

  recordFailure(address: string, email: string): void {
    this.bump(`acct:${address}|${email.toLowerCase()}`);
    this.bump(`addr:${address}`);
  }

  recordSuccess(address: string, email: string): void {
    this.counters.delete(`acct:${address}|${email.toLowerCase()}`);
  }

  private blockedFor(key: string, limit: number): number {
    const c = this.counters.get(key);
    if (!c) return 0;
    const elapsed = this.now() - c.windowStart;
    if (elapsed >= WINDOW_MS) {
      this.counters.delete(key);
      return 0;
    }
    return c.failures >= limit ? WINDOW_MS - elapsed : 0;
  }

  private bump(key: string): void {
    const c = this.counters.get(key);
    if (!c || this.now() - c.windowStart >= WINDOW_MS) this.counters.set(key, { failures: 1, windowStart: this.now() });
    else c.failures += 1;
    if (this.counters.size > 100_000) this.counters.clear(); // bound memory under a flood
  }
}

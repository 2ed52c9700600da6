import { Inject, Injectable } from '@nestjs/common';
import pg from 'pg';
import { PG_POOL } from '../database/database.tokens.js';

export interface AttemptPolicy {
  /** Attempts allowed without waiting. */
  free: number;
  /** First wait once the free attempts are used, seconds; it doubles with each further attempt. */
  firstDelaySeconds: number;
  /** Longest wait between further attempts, seconds. */
  maxDelaySeconds: number;
  /** A key with no attempt for this long starts again from zero, seconds. */
  quietResetSeconds: number;
}

// The wait before the next attempt of a key with `failures` counted attempts: 0 below `free`,
// then first, 2 × first, 4 × first … seconds up to the cap. The exponent is bounded so power() cannot overflow.
const waitSql = (free: string, cap: string, first: string) =>
  `make_interval(secs => case when a.failures < ${free} then 0 else least(${cap}::float8, ${first}::float8 * power(2, least(a.failures - ${free}, 30))) end)`;

/**
 * The counters' SQL. It runs on the pool itself, never in a request's transaction: a refused
 * sign-in answers 401 or 429 and its count must still commit.
 */
@Injectable()
export class SignInAttemptsRepository {
  constructor(@Inject(PG_POOL) private readonly pool: pg.Pool) {}

  /**
   * Counts one attempt of `key` if its wait is over, in one atomic statement (concurrent attempts
   * queue on the row lock and each sees the count before it). Returns the wait in seconds when
   * the attempt is refused, null when it was counted.
   */
  async charge(key: string, policy: AttemptPolicy): Promise<number | null> {
    const counted = await this.pool.query(
      `insert into sign_in_attempts as a (key, failures, last_attempt_at) values ($1, 1, now())
       on conflict (key) do update set
         failures = case when a.last_attempt_at < now() - make_interval(secs => $4) then 1 else a.failures + 1 end,
         last_attempt_at = now()
       where a.last_attempt_at < now() - make_interval(secs => $4) or a.failures < $2 or a.last_attempt_at <= now() - ${waitSql('$2', '$3', '$5')}
       returning failures`,
      [key, policy.free, policy.maxDelaySeconds, policy.quietResetSeconds, policy.firstDelaySeconds],
    );
    if (counted.rowCount) return null;
    const left = await this.pool.query<{ wait: string }>(
      `select greatest(1, ceil(extract(epoch from (a.last_attempt_at + ${waitSql('$2', '$3', '$4')} - now())))) as wait
       from sign_in_attempts a where a.key = $1`,
      [key, policy.free, policy.maxDelaySeconds, policy.firstDelaySeconds],
    );
    return Number(left.rows[0]?.wait ?? 1);
  }

  /** Takes back one counted attempt (a sign-in that succeeded, or one refused for another reason). */
  async refund(key: string): Promise<void> {
    await this.pool.query(`update sign_in_attempts set failures = greatest(failures - 1, 0) where key = $1`, [key]);
  }

  async clear(key: string): Promise<void> {
    await this.pool.query(`delete from sign_in_attempts where key = $1`, [key]);
  }

  /** Forgets keys quiet for longer than the reset time, so random e-mails do not pile up. */
  async prune(quietResetSeconds: number): Promise<void> {
    await this.pool.query(`delete from sign_in_attempts where last_attempt_at < now() - make_interval(secs => $1)`, [
      quietResetSeconds,
    ]);
  }
}

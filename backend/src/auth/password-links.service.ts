import { SessionCache } from '../database/session-cache.js';
import { GoneException, HttpException, HttpStatus, Injectable, NotFoundException } from '@nestjs/common';
import { createHash, randomBytes } from 'node:crypto';
import { MailLinks } from '../mail/mail-links.js';
import { MailService } from '../mail/mail.service.js';
import { RecordsService } from '../records/records.service.js';
import { AuthRepository } from './auth.repository.js';
import { hashPassword } from './password.js';
import { passwordChangedMail, passwordForgottenMail } from './password-links.mails.js';
import { SignInThrottle, SignInThrottled } from './login-throttle.js';
import { TransactionContext } from '../database/transaction-context.js';
import { PasswordLinksRepository } from './password-links.repository.js';

export const LINK_HOURS = 72;

const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');

/** Set-your-password links: single use, expiring, only their hash stored, mailed to their person only. */
@Injectable()
export class PasswordLinksService {
  constructor(
    private readonly repo: PasswordLinksRepository,
    private readonly accounts: AuthRepository,
    private readonly records: RecordsService,
    private readonly mail: MailService,
    private readonly links: MailLinks,
    private readonly throttle: SignInThrottle,
    private readonly transactions: TransactionContext,
    private readonly sessions: SessionCache,
  ) {}

  /**
   * "Forgot my password": a link to choose a new one goes to the address, and only to it, when an
   * active account has it. The answer is the same either way, so nobody learns which addresses
   * have accounts; requests are counted per address and per e-mail like sign-ins, outside the
   * command so a refused one still counts. The current password keeps working until the link is used.
   */
  async requestByEmail(email: string, address: string): Promise<void> {
    const key = `forgot:${email.trim().toLowerCase()}`;
    try {
      await this.transactions.outside(() => this.throttle.check(key, address));
    } catch (err) {
      if (!(err instanceof SignInThrottled)) throw err;
      const wait =
        err.retryAfterSeconds >= 60
          ? `${Math.ceil(err.retryAfterSeconds / 60)} minutes`
          : `${err.retryAfterSeconds} seconds`;
      throw new HttpException(
        {
          statusCode: 429,
          message: `Too many requests for a password link. Try again in ${wait}.`,
          retryAfterSeconds: err.retryAfterSeconds,
        },
        HttpStatus.TOO_MANY_REQUESTS,
      );
    }
    const account = await this.accounts.findActiveByEmail(email);
    if (!account) return;
    const link = await this.create(account.id, 'reset');
    await this.records.audit(
      { id: null, name: account.name, workshopId: account.workshopId },
      {
        recordType: 'password',
        recordId: account.id,
        action: 'password-link-requested',
        summary: `A link to choose a new password was e-mailed to ${account.name} (asked for on the sign-in page)`,
      },
    );
    const { subject, text } = passwordForgottenMail({
      name: account.name,
      workshopName: account.workshopName,
      url: link.url,
      hours: LINK_HOURS,
    });
    this.mail.later(
      () => this.mail.send({ workshopId: account.workshopId, to: [account.email], subject, text }),
      'password link mail',
    );
  }

  /** A new link for the person; the token itself is returned once, to be mailed, and never stored. */
  async create(
    userId: string,
    purpose: 'invitation' | 'reset' = 'invitation',
  ): Promise<{ url: string; expiresAt: Date }> {
    const token = randomBytes(32).toString('base64url');
    const expiresAt = new Date(Date.now() + LINK_HOURS * 3600_000);
    await this.repo.insert({ userId, tokenHash: hashToken(token), purpose, expiresAt });
    return { url: this.links.setPassword(token), expiresAt };
  }

  /** Whom the link is for, so the page can greet them; 404 unknown, 410 used or expired. */
  async inspect(token: string) {
    const found = await this.usable(token);
    return {
      email: found.email,
      name: found.name,
      workshop: found.workshopName,
      expiresAt: found.link.expiresAt.toISOString(),
    };
  }

  /**
   * Sets the password, ends every session the person had, keeps it in the history and tells
   * them by mail, so a change they did not make does not go unnoticed.
   */
  async setPassword(token: string, password: string): Promise<{ email: string; userId: string }> {
    const found = await this.usable(token);
    const person = { id: found.link.userId, name: found.name, workshopId: found.workshopId };
    const ok = await this.repo.consume(found.link.id, person, await hashPassword(password));
    if (!ok) throw new GoneException('This link has already been used. Sign in, or ask an admin for a new link.');
    const now = new Date();
    await this.accounts.endSessions(person.id, now);
    this.transactions.afterCommit(() => this.sessions.forgetPerson(person.id));
    const first = found.link.purpose === 'invitation';
    await this.records.audit(person, {
      recordType: 'password',
      recordId: person.id,
      action: first ? 'first-password-set' : 'password-changed',
      summary: first
        ? `${found.name} chose their first password`
        : `${found.name} chose a new password; every earlier session was signed out`,
    });
    if (!first) {
      const { subject, text } = passwordChangedMail({ name: found.name, workshopName: found.workshopName, at: now });
      this.mail.later(
        () => this.mail.send({ workshopId: found.workshopId, to: [found.email], subject, text }),
        'password-changed mail',
      );
    }
    return { email: found.email, userId: person.id };
  }

  private async usable(token: string) {
    const found = await this.repo.findByHash(hashToken(token));
    if (!found || !found.active)
      throw new NotFoundException('This link is not valid. Ask an admin of your workshop for a new one.');
    if (found.link.usedAt)
      throw new GoneException('This link has already been used. Sign in, or ask an admin for a new link.');
    if (found.link.expiresAt.getTime() <= Date.now())
      throw new GoneException(
        `This link has expired (links work for ${LINK_HOURS} hours). Ask an admin for a new one.`,
      );
    return found;
  }
}

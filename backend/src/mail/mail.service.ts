import { Injectable, Logger, OnModuleDestroy, OnModuleInit } from '@nestjs/common';
import path from 'node:path';
import nodemailer, { type Transporter } from 'nodemailer';
import { TransactionContext } from '../database/transaction-context.js';
import { FakeSmtpServer } from './fake-smtp.server.js';
import { mailSettings, type MailSettings } from './mail-settings.js';

export interface OutgoingMail {
  /** The workshop the message concerns; the development outbox shows an admin only theirs. */
  workshopId: string;
  to: string[];
  subject: string;
  text: string;
  html?: string;
  attachments?: { filename: string; content: Buffer; contentType: string }[];
}

export const WORKSHOP_HEADER = 'X-Railwright-Workshop';

/**
 * Sends the product's e-mail over SMTP. Without SMTP_HOST (development, tests) it starts the
 * in-process fake server and sends to it, so every message can be read back on the outbox page.
 */
@Injectable()
export class MailService implements OnModuleInit, OnModuleDestroy {
  private readonly logger = new Logger(MailService.name);
  private readonly settings: MailSettings = mailSettings();
  private transport: Transporter | null = null;
  /** Present only while the fake server is in use. */
  fake: FakeSmtpServer | null = null;
  private readonly pending = new Set<Promise<unknown>>();

  constructor(private readonly transactions: TransactionContext) {}

  async onModuleInit() {
    const s = this.settings;
    if (s.mode === 'off') {
      this.logger.warn('SMTP_HOST is not set: e-mail is switched off');
      return;
    }
    if (s.mode === 'fake') {
      this.fake = new FakeSmtpServer();
      if (process.env.RAILWRIGHT_DATA && !process.env.JEST_WORKER_ID)
        this.fake.mailDrop = path.join(path.resolve(process.env.RAILWRIGHT_DATA), 'mail');
      const port = await this.fake.start(s.port);
      this.transport = nodemailer.createTransport({ host: '127.0.0.1', port, secure: false, ignoreTLS: true });
      if (!process.env.JEST_WORKER_ID)
        this.logger.log(
          `Mail goes to the local fake SMTP server on 127.0.0.1:${port} (read it on the outbox page; whole messages, password links included, in ${this.fake.mailDrop ?? 'memory only'})`,
        );
      return;
    }
    this.transport = nodemailer.createTransport({
      host: s.host!,
      port: s.port,
      secure: s.secure,
      // Bounded, so a mail server that does not answer never holds a request for minutes.
      connectionTimeout: 10_000,
      greetingTimeout: 10_000,
      socketTimeout: 20_000,
      ...(s.user ? { auth: { user: s.user, pass: s.password ?? '' } } : {}),
    });
  }

  async onModuleDestroy() {
    // Let mail already on its way go out before the transport closes (the database is still up).
    await Promise.allSettled([...this.pending]);
    this.transport?.close();
    await this.fake?.stop();
  }

  /**
   * Runs mail work once the command has committed (a slow mail server never holds up a request,
   * and a command that fails sends nothing); failures are logged, and shutdown waits for it.
   */
  later(work: () => Promise<unknown>, what: string): void {
    this.transactions.afterCommit(() => this.track(this.transactions.outside(work), what));
  }

  private track(work: Promise<unknown>, what: string): void {
    const tracked = work
      .catch((err) => this.logger.error(`${what} failed: ${(err as Error).message}`))
      .finally(() => this.pending.delete(tracked));
    this.pending.add(tracked);
  }

  /** Hands the message over; a failure is logged and reported as false, never thrown at the caller. */
  async send(mail: OutgoingMail): Promise<boolean> {
    const to = [...new Set(mail.to.filter(Boolean))];
    if (!this.transport || !to.length) return false;
    try {
      await this.transport.sendMail({
        from: this.settings.from,
        to,
        subject: mail.subject,
        text: mail.text,
        html: mail.html,
        textEncoding: 'base64',
        headers: { [WORKSHOP_HEADER]: mail.workshopId },
        attachments: mail.attachments,
      });
      return true;
    } catch (err) {
      this.logger.error(`mail "${mail.subject}" to ${to.join(', ')} failed: ${(err as Error).message}`);
      return false;
    }
  }
}

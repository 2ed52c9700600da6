import { SMTPServer } from 'smtp-server';
import type { AddressInfo } from 'node:net';
import { mkdir, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { randomUUID } from 'node:crypto';
import { parseMail, type ParsedMail } from './mime-parse.js';

export interface CapturedMail extends ParsedMail {
  id: string;
  receivedAt: Date;
  envelopeTo: string[];
  raw: Buffer;
}

// Enough for a development session; older messages fall off the end.
const KEEP = 300;
const MAX_MESSAGE_BYTES = 20 * 1024 * 1024;

/**
 * The local stand-in for a mail server in development and tests: an in-process SMTP server on
 * 127.0.0.1 that keeps every message in memory instead of delivering it.
 */
export class FakeSmtpServer {
  readonly messages: CapturedMail[] = [];
  private server: SMTPServer | null = null;
  private waiters: { test: (m: CapturedMail) => boolean; resolve: (m: CapturedMail) => void }[] = [];
  port = 0;

  async start(port = 0): Promise<number> {
    this.server = new SMTPServer({
      authOptional: true,
      disabledCommands: ['STARTTLS', 'AUTH'],
      logger: false,
      size: MAX_MESSAGE_BYTES,
      onData: (stream, session, callback) => {
        const chunks: Buffer[] = [];
        stream.on('data', (c: Buffer) => chunks.push(c));
        stream.on('end', () => {
          const raw = Buffer.concat(chunks);
          const envelopeTo = session.envelope.rcptTo.map((r) => r.address);
          // Taken as received only once read, so a sender that waits for the answer finds it in the outbox.
          parseMail(raw).then(
            (parsed) => {
              this.capture({ id: randomUUID(), receivedAt: new Date(), envelopeTo, raw, ...parsed });
              callback();
            },
            (err: Error) => callback(err),
          );
        });
      },
    });
    await new Promise<void>((resolve, reject) => {
      this.server!.once('error', reject);
      this.server!.listen(port, '127.0.0.1', () => resolve());
    });
    this.port = (this.server.server.address() as AddressInfo).port;
    return this.port;
  }

  async stop(): Promise<void> {
    const server = this.server;
    this.server = null;
    if (server) await new Promise<void>((resolve) => server.close(() => resolve()));
  }

  /** The first message (already captured or still to come) that passes the test. */
  waitFor(test: (m: CapturedMail) => boolean, timeoutMs = 5000): Promise<CapturedMail> {
    const found = this.messages.find(test);
    if (found) return Promise.resolve(found);
    return new Promise((resolve, reject) => {
      const waiter = { test, resolve };
      this.waiters.push(waiter);
      setTimeout(() => {
        this.waiters = this.waiters.filter((w) => w !== waiter);
        reject(new Error('no such message arrived at the fake SMTP server'));
      }, timeoutMs).unref();
    });
  }

  /**
   * Where each caught message is also written as a file (mode 600): in development the person a
   * password link is for is whoever runs the machine, and the outbox page never shows such links.
   */
  mailDrop: string | null = null;

  private capture(mail: CapturedMail) {
    if (this.mailDrop) {
      const file = path.join(
        this.mailDrop,
        `${mail.receivedAt.toISOString().replace(/[:.]/g, '-')}-${mail.id.slice(0, 8)}.eml`,
      );
      mkdir(this.mailDrop, { recursive: true, mode: 0o700 })
        .then(() => writeFile(file, mail.raw, { mode: 0o600 }))
        .catch(() => undefined);
    }
    this.messages.unshift(mail);
    if (this.messages.length > KEEP) this.messages.length = KEEP;
    for (const w of [...this.waiters]) {
      if (w.test(mail)) {
        this.waiters = this.waiters.filter((x) => x !== w);
        w.resolve(mail);
      }
    }
  }
}

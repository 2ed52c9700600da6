import { Inject, Injectable, Logger, OnApplicationShutdown, OnModuleInit } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { randomUUID } from 'node:crypto';
import pg from 'pg';
import type { RailwrightConfig } from '../config/app-config.module.js';
import { SESSION_CHANGES_CHANNEL, SessionCache } from './session-cache.js';

const RECONNECT_MS = 2_000;

/**
 * Listens on its own connection for the database's announcements of changed sessions, people and
 * workshops, and tells the session cache. While the connection is down the cache serves nothing,
 * so a change is never missed: every request then reads its session again.
 */
@Injectable()
export class SessionChangesListener implements OnModuleInit, OnApplicationShutdown {
  private readonly logger = new Logger(SessionChangesListener.name);
  private client: pg.Client | null = null;
  private stopping = false;
  private retry: NodeJS.Timeout | null = null;
  private readonly marks = new Map<string, () => void>();

  constructor(
    @Inject(SessionCache) private readonly cache: SessionCache,
    @Inject(ConfigService) private readonly config: ConfigService<RailwrightConfig, true>,
  ) {}

  async onModuleInit(): Promise<void> {
    await this.connect();
  }

  async onApplicationShutdown(): Promise<void> {
    this.stopping = true;
    if (this.retry) clearTimeout(this.retry);
    this.cache.setListening(false);
    await this.client?.end().catch(() => undefined);
  }

  /**
   * Resolves once every change committed before the call has been heard: announcements arrive in
   * the order they were committed, so hearing a mark sent now means hearing all before it. For a
   * change made outside this server (another server, or by hand) that must count at once.
   */
  async caughtUp(timeoutMs = 5_000): Promise<void> {
    if (!this.client) return;
    const mark = `mark:${randomUUID()}`;
    const heard = new Promise<void>((resolve, reject) => {
      const timer = setTimeout(() => {
        this.marks.delete(mark);
        reject(new Error(`session change announcements not heard within ${timeoutMs} ms`));
      }, timeoutMs);
      this.marks.set(mark, () => {
        clearTimeout(timer);
        this.marks.delete(mark);
        resolve();
      });
    });
    await this.client.query('select pg_notify($1, $2)', [SESSION_CHANGES_CHANNEL, mark]);
    await heard;
  }

  private async connect(): Promise<void> {
    const client = new pg.Client({
      connectionString: this.config.get('app', { infer: true }).databaseUrl,
      // Named so an operator (or a test) can tell this process's listening connection apart.
      application_name: `railwright-session-changes-${process.pid}`,
    });
    const lost = (err?: Error) => {
      if (this.client !== client) return;
      this.client = null;
      this.cache.setListening(false);
      if (this.stopping) return;
      if (err)
        this.logger.warn(
          `Session change announcements lost (${err.message}); sessions are read each time until they return`,
        );
      void client.end().catch(() => undefined);
      this.retry = setTimeout(() => void this.connect(), RECONNECT_MS);
    };
    client.on('notification', (n) => {
      if (n.channel !== SESSION_CHANGES_CHANNEL) return;
      const payload = n.payload ?? '';
      const mark = payload.startsWith('mark:') ? this.marks.get(payload) : undefined;
      if (mark) mark();
      else this.cache.announced(payload);
    });
    client.on('error', lost);
    client.on('end', () => lost());
    this.client = client;
    try {
      await client.connect();
      await client.query(`LISTEN ${SESSION_CHANGES_CHANNEL}`);
      if (this.client === client && !this.stopping) this.cache.setListening(true);
    } catch (err) {
      lost(err as Error);
    }
  }
}

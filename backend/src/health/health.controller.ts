import { Controller, Get, Inject, Res } from '@nestjs/common';
import type { FastifyReply } from 'fastify';
import pg from 'pg';
import { Public } from '../auth/decorators.js';
import { PG_POOL } from '../database/database.tokens.js';

@Controller('health')
export class HealthController {
  constructor(@Inject(PG_POOL) private readonly pool: pg.Pool) {}

  @Public()
  @Get()
  async health(@Res({ passthrough: true }) reply: FastifyReply) {
    let timer: NodeJS.Timeout | undefined;
    try {
      await Promise.race([
        this.pool.query('select 1'),
        new Promise((_, reject) => {
          timer = setTimeout(() => reject(new Error('timeout')), 2000);
        }),
      ]);
      return { status: 'ok', database: 'ok' };
    } catch {
      reply.status(503);
      return { status: 'degraded', database: 'unreachable' };
    } finally {
      // A pending timer per answered check would keep a stopping process alive for 2 s.
      clearTimeout(timer);
    }
  }
}

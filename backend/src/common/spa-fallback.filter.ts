import { ArgumentsHost, Catch, ExceptionFilter, NotFoundException } from '@nestjs/common';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import type { FastifyReply, FastifyRequest } from 'fastify';

/**
 * Client routes work on reload: a browser GET for a path outside /api that matched nothing gets
 * the single-page app; every other 404 stays JSON.
 */
@Catch(NotFoundException)
export class SpaFallbackFilter implements ExceptionFilter {
  private indexHtml: string | null = null;

  constructor(private readonly distFolder: string | null) {}

  catch(exception: NotFoundException, host: ArgumentsHost) {
    const req = host.switchToHttp().getRequest<FastifyRequest>();
    const reply = host.switchToHttp().getResponse<FastifyReply>();
    const wantsPage =
      req.method === 'GET' && !req.url.startsWith('/api') && (req.headers.accept ?? '').includes('text/html');
    const html = wantsPage ? this.loadIndex() : null;
    if (html) {
      reply
        .status(200)
        .header('content-type', 'text/html; charset=utf-8')
        .header('cache-control', 'no-cache')
        .send(html);
      return;
    }
    reply.status(404).send(exception.getResponse());
  }

  private loadIndex(): string | null {
    if (!this.distFolder) return null;
    try {
      this.indexHtml ??= readFileSync(path.join(this.distFolder, 'index.html'), 'utf8');
    } catch {
      return null;
    }
    return this.indexHtml;
  }
}

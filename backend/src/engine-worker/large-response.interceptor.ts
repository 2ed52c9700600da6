import { Injectable, type CallHandler, type ExecutionContext, type NestInterceptor } from '@nestjs/common';
import negotiate from '@fastify/accept-negotiator';
import type { FastifyReply, FastifyRequest } from 'fastify';
import { mergeMap, type Observable } from 'rxjs';
import { Readable } from 'node:stream';
import { EnginePool } from './engine-pool.js';
import { sizeOf } from './number-arrays.js';

/**
 * From this many numbers and entries on, an answer is written as JSON (and compressed) in the
 * worker thread: a 200 000-station fit with its residuals is about 10 MB of JSON, 70 ms of
 * JSON.stringify and 80 ms of compression on the event loop, during which nobody else is answered.
 */
export const LARGE_RESPONSE_ENTRIES = 50_000;

/** Answers large JSON bodies as bytes written off the event loop; everything else passes untouched. */
@Injectable()
export class LargeResponseInterceptor implements NestInterceptor {
  constructor(private readonly pool: EnginePool) {}

  intercept(context: ExecutionContext, next: CallHandler): Observable<unknown> {
    if (context.getType() !== 'http' || !this.pool.threaded) return next.handle();
    return next.handle().pipe(
      mergeMap(async (body: unknown) => {
        if (body === null || typeof body !== 'object' || Buffer.isBuffer(body) || body instanceof Readable) return body;
        if (sizeOf(body, LARGE_RESPONSE_ENTRIES) < LARGE_RESPONSE_ENTRIES) return body;
        const http = context.switchToHttp();
        const request = http.getRequest<FastifyRequest>();
        const reply = http.getResponse<FastifyReply>();
        const accepted = request.headers['accept-encoding'];
        const encoding = typeof accepted === 'string' ? negotiate(accepted, ['br', 'gzip']) : null;
        const bytes = await this.pool.serialize(body, encoding);
        reply.header('content-type', 'application/json; charset=utf-8');
        reply.header('vary', 'accept-encoding');
        if (encoding) reply.header('content-encoding', encoding);
        return bytes;
      }),
    );
  }
}

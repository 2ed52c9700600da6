import { ArgumentsHost, Catch, ExceptionFilter, HttpException, Logger } from '@nestjs/common';
import type { FastifyReply } from 'fastify';

interface PgError {
  code?: string;
  detail?: string;
  constraint?: string;
  cause?: PgError;
}

// Database refusals that mean "bad request", not "server broke".
const CLIENT_CODES: Record<string, { status: number; message: string }> = {
  '22P02': { status: 400, message: 'A value has the wrong form (for example an id that is not a uuid)' },
  '22003': { status: 400, message: 'A number is out of range' },
  // Text the database cannot store (NUL, invalid characters): refused before it gets here; a backstop.
  '22021': { status: 400, message: 'A text holds a character that cannot be stored' },
  '22P05': { status: 400, message: 'A text holds a character that cannot be stored' },
  '23505': { status: 409, message: 'That record already exists' },
  '23503': { status: 400, message: 'A referenced record does not exist' },
  '23514': { status: 400, message: 'A value breaks a rule of the record' },
};

/** Last line: known database refusals become 4xx with a message; anything else is logged as a 500. */
@Catch()
export class DatabaseErrorFilter implements ExceptionFilter {
  private readonly logger = new Logger('Errors');

  catch(exception: unknown, host: ArgumentsHost) {
    const reply = host.switchToHttp().getResponse<FastifyReply>();
    if (exception instanceof HttpException) {
      reply.status(exception.getStatus()).send(exception.getResponse());
      return;
    }
    const err = exception as PgError & { statusCode?: number; message?: string };
    const code = err?.code ?? err?.cause?.code;
    // Refusals raised by the database's own rules (approval locks, append-only history) carry a
    // message written for people: pass it on.
    const own = code?.startsWith('RW') ? (err.cause?.code === code ? err.cause : err) : null;
    if (own) {
      const status = Number(code!.slice(2));
      reply.status(status).send({
        statusCode: status,
        message: (own as { message?: string }).message,
        error: status === 409 ? 'Conflict' : 'Forbidden',
      });
      return;
    }
    const known = code ? CLIENT_CODES[code] : undefined;
    if (known) {
      reply.status(known.status).send({ statusCode: known.status, message: known.message, error: code });
      return;
    }
    // A deadlock or serialization failure that outlived the command's reruns (transaction-context.ts):
    // the change was not made and can be sent again; never a 500.
    if (code === '40P01' || code === '40001') {
      reply.header('retry-after', '1').status(503).send({
        statusCode: 503,
        message: 'Others were changing the same records at that moment; nothing was saved. Send it again.',
        error: 'Service Unavailable',
      });
      return;
    }
    // Fastify's own errors (bad JSON, body too large) carry their status.
    if (err?.statusCode && err.statusCode >= 400 && err.statusCode < 500) {
      reply.status(err.statusCode).send({ statusCode: err.statusCode, message: err.message });
      return;
    }
    this.logger.error(loggable(exception));
    reply.status(500).send({ statusCode: 500, message: 'Something went wrong on the server' });
  }
}

/**
 * What a failure leaves in the log: a failed query's text and the database's own message, never
 * its parameters (they can hold password hashes, tokens or anything a person typed).
 */
export function loggable(exception: unknown): string {
  const e = exception as {
    query?: unknown;
    params?: unknown;
    cause?: { message?: string; code?: string };
    stack?: string;
    name?: string;
  };
  if (e && typeof e === 'object' && typeof e.query === 'string' && 'params' in e) {
    const cause = e.cause ? ` — ${e.cause.code ?? ''} ${e.cause.message ?? ''}`.trimEnd() : '';
    const where = (e.stack ?? '')
      .split('\n')
      .filter((l) => l.trim().startsWith('at '))
      .slice(0, 5)
      .join('\n');
    return `Failed query: ${e.query}${cause}\n${where}`;
  }
  return exception instanceof Error ? (exception.stack ?? exception.message) : String(exception);
}

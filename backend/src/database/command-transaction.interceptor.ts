import { CallHandler, ExecutionContext, Injectable, NestInterceptor } from '@nestjs/common';
import type { FastifyReply } from 'fastify';
import { from, lastValueFrom, type Observable } from 'rxjs';
import type { SessionUser } from '../auth/session-user.js';
import { CommandKeys, KEY_HEADER, RepeatedCommand } from './command-keys.js';
import { TransactionContext } from './transaction-context.js';

const READS = new Set(['GET', 'HEAD', 'OPTIONS']);

type CommandRequest = {
  method: string;
  url: string;
  user?: SessionUser;
  headers: Record<string, string | string[] | undefined>;
};

/**
 * Every state-changing request is one transaction: whatever the handler writes commits together
 * when it answers, and nothing of it stays when it throws. A deadlock or serialization failure
 * reruns the handler, except for uploads, whose body can be read only once. A command sent with a
 * client-made key (Idempotency-Key) runs once per key; a repeat gets the first answer.
 */
@Injectable()
export class CommandTransactionInterceptor implements NestInterceptor {
  constructor(
    private readonly transactions: TransactionContext,
    private readonly keys: CommandKeys,
  ) {}

  intercept(ctx: ExecutionContext, next: CallHandler): Observable<unknown> {
    if (ctx.getType() !== 'http') return next.handle();
    const req = ctx.switchToHttp().getRequest<CommandRequest>();
    if (READS.has(req.method)) return next.handle();
    const user = req.user;
    const actor = user ? { id: user.id, name: user.name, workshopId: user.workshopId } : undefined;
    const retry = !String(req.headers['content-type'] ?? '').startsWith('multipart/');
    const key = user ? CommandKeys.keyOf(req.headers[KEY_HEADER]) : null;
    const handle = () => lastValueFrom(next.handle(), { defaultValue: undefined });
    if (!key || !user) return from(this.transactions.run(handle, { actor, retry }));
    const keyed = { key, userId: user.id, method: req.method, path: req.url.split('?')[0] };
    return from(
      this.transactions
        .run(() => this.keys.once(keyed, handle), { actor, retry })
        .then((answer) => {
          if (!(answer instanceof RepeatedCommand)) return answer;
          ctx.switchToHttp().getResponse<FastifyReply>().header('idempotent-replay', 'true');
          return answer.response;
        }),
    );
  }
}

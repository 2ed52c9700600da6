import { CallHandler, ExecutionContext, Injectable, NestInterceptor } from '@nestjs/common';
import { from, lastValueFrom, type Observable } from 'rxjs';
import type { SessionUser } from '../auth/session-user.js';
import { TransactionContext } from './transaction-context.js';

const READS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Every state-changing request is one transaction: whatever the handler writes commits together
 * when it answers, and nothing of it stays when it throws. A deadlock or serialization failure
 * reruns the handler, except for uploads, whose body can be read only once.
 */
@Injectable()
export class CommandTransactionInterceptor implements NestInterceptor {
  constructor(private readonly transactions: TransactionContext) {}

  intercept(ctx: ExecutionContext, next: CallHandler): Observable<unknown> {
    if (ctx.getType() !== 'http') return next.handle();
    const req = ctx.switchToHttp().getRequest<{ method: string; user?: SessionUser; headers: Record<string, string | undefined> }>();
    if (READS.has(req.method)) return next.handle();
    const user = req.user;
    const actor = user ? { id: user.id, name: user.name, workshopId: user.workshopId } : undefined;
    const retry = !(req.headers['content-type'] ?? '').startsWith('multipart/');
    return from(this.transactions.run(() => lastValueFrom(next.handle(), { defaultValue: undefined }), { actor, retry }));
  }
}

import { Injectable, type CallHandler, type ExecutionContext, type NestInterceptor } from '@nestjs/common';
import { from, switchMap, type Observable } from 'rxjs';
import type { SessionUser } from '../auth/session-user.js';
import { RecheckService } from './recheck.service.js';

// A machine file. The machines list asks the schedule itself, only when a machine is due; the
// readiness board sweeps by itself.
const MACHINE_READS = /^\/api\/machines\/[0-9a-f-]{36}\/?(\?.*)?$/i;

/** Brings re-check dates up to date before machines are read, so nobody sees a stale state. */
@Injectable()
export class RecheckInterceptor implements NestInterceptor {
  constructor(private readonly recheck: RecheckService) {}

  intercept(context: ExecutionContext, next: CallHandler): Observable<unknown> {
    const req = context.switchToHttp().getRequest<{ method: string; url: string; user?: SessionUser }>();
    if (req.method !== 'GET' || !req.user || !MACHINE_READS.test(req.url)) return next.handle();
    return from(this.recheck.sweepWorkshop(req.user.workshopId)).pipe(switchMap(() => next.handle()));
  }
}

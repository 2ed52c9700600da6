import { Injectable } from '@nestjs/common';
import type { SessionUser } from '../auth/session-user.js';
import { MachinesService } from '../machines/machines.service.js';
import { ReadinessSummaryService } from '../records/readiness-summary.service.js';
import { ApprovalsRepository } from './approvals.repository.js';
import type { ApprovalSnapshot, BoardCheck } from './snapshot.js';

export type BoardMachine = Awaited<ReturnType<MachinesService['getRef']>>;

// The machine comes with the board's first statement (with its target set and waivers); another
// workshop's machine is a 404 there, as getRef gives it.

/**
 * Puts together what every contributor reports for a machine, with the waivers applied. The
 * board reads summary columns only; the approval snapshot also reads the certificate's series.
 */
@Injectable()
export class ReadinessBoardService {
  constructor(
    private readonly machines: MachinesService,
    private readonly readiness: ReadinessSummaryService,
    private readonly repo: ApprovalsRepository,
  ) {}

  async board(
    actor: SessionUser | { workshopId: string },
    machineId: string,
    options: { series: boolean } = { series: false },
  ) {
    const { machine, checks, blocking, targetSet } = await this.readiness.evaluate(
      actor.workshopId,
      machineId,
      options,
    );
    return { machine: machine as BoardMachine, checks, blocking, targetSet };
  }

  /** The exact data an approval keeps and the certificate is drawn from. */
  async snapshot(
    actor: SessionUser,
    machineId: string,
  ): Promise<{ snapshot: ApprovalSnapshot; blocking: BoardCheck[] }> {
    const b = await this.board(actor, machineId, { series: true });
    const full = await this.machines.get(actor, machineId);
    return {
      blocking: b.blocking,
      snapshot: {
        version: 1,
        workshop: { id: actor.workshopId, name: await this.repo.workshopName(actor.workshopId) },
        machine: { id: b.machine.id, name: b.machine.name, kind: b.machine.kind, workArea: full.workArea },
        targetSet: b.targetSet,
        checks: b.checks,
      },
    };
  }
}

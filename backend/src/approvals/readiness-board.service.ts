import { Injectable } from '@nestjs/common';
import type { SessionUser } from '../auth/session-user.js';
import { MachinesService } from '../machines/machines.service.js';
import { ReadinessRegistry } from '../records/readiness.registry.js';
import { TargetSetsService } from '../target-sets/target-sets.service.js';
import { ApprovalsRepository } from './approvals.repository.js';
import { blockingOf, boardChecks } from './board.js';
import type { ApprovalSnapshot, BoardCheck } from './snapshot.js';

export type BoardMachine = Awaited<ReturnType<MachinesService['getRef']>>;

/** Puts together what every contributor reports for a machine, with the waivers applied. */
@Injectable()
export class ReadinessBoardService {
  constructor(
    private readonly machines: MachinesService,
    private readonly registry: ReadinessRegistry,
    private readonly targetSets: TargetSetsService,
    private readonly repo: ApprovalsRepository,
  ) {}

  async board(actor: SessionUser | { workshopId: string }, machineId: string) {
    const machine = await this.machines.getRef(actor, machineId);
    const [raw, waivers, targetSet] = await Promise.all([
      this.registry.checksFor(machine),
      this.repo.waivers(machine.workshopId, machine.id),
      this.targetSets.findRow(machine.workshopId, machine.targetSetId),
    ]);
    const checks = boardChecks(raw, waivers);
    const interval = targetSet.targets.recheckIntervalDays;
    return { machine, checks, blocking: blockingOf(checks), targetSet: { id: targetSet.id, name: targetSet.name, recheckIntervalDays: Math.round(interval?.value ?? 180) } };
  }

  /** The exact data an approval keeps and the certificate is drawn from. */
  async snapshot(actor: SessionUser, machineId: string): Promise<{ snapshot: ApprovalSnapshot; blocking: BoardCheck[] }> {
    const b = await this.board(actor, machineId);
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

import { Injectable, NotFoundException } from '@nestjs/common';
import type { SQL } from 'drizzle-orm';
import { ReadinessSummaryRepository } from './readiness-summary.repository.js';
import type { MachineRef, ReadinessCheck, ReadinessContext, ReadinessContributor } from './readiness.js';

/** Domain modules register here on init; the readiness board asks all of them. */
@Injectable()
export class ReadinessRegistry {
  private readonly contributors: ReadinessContributor[] = [];
  /** Which contributors have reported each check kind (learnt from their answers). */
  private readonly kinds = new Map<string, Set<number>>();

  constructor(private readonly repo: ReadinessSummaryRepository) {}

  register(contributor: ReadinessContributor): void {
    this.contributors.push(contributor);
  }

  /** How many contributors there are: a stored summary counted with another number is counted again. */
  get size(): number {
    return this.contributors.length;
  }

  /** Without a context, reads the machine's target set itself and includes the data series. */
  async checksFor(machine: MachineRef, context?: ReadinessContext): Promise<ReadinessCheck[]> {
    if (!context) {
      const set = await this.repo.targetSet(machine.workshopId, machine.targetSetId);
      if (!set) throw new NotFoundException('No such target set in this workshop');
      return this.checksFor(machine, { targets: set.targets, series: true });
    }
    return (await this.byContributor(machine, context)).flat();
  }

  /** Every contributor's checks, in registration order. */
  async byContributor(machine: MachineRef, context: ReadinessContext): Promise<ReadinessCheck[][]> {
    const lists = await Promise.all(this.contributors.map((c) => c.checksFor(machine, context)));
    lists.forEach((list, index) => this.learn(index, list));
    return lists;
  }

  /** One contributor's checks. */
  async checksOf(index: number, machine: MachineRef, context: ReadinessContext): Promise<ReadinessCheck[]> {
    const list = await this.contributors[index].checksFor(machine, context);
    this.learn(index, list);
    return list;
  }

  /** The first read a contributor offers to send with the machine's context, if it offers one. */
  firstReadOf(index: number, workshopId: string, machineId: string): SQL | undefined {
    return this.contributors[index].firstRead?.sql(workshopId, machineId);
  }

  /** One contributor's checks from the value of its first read (see firstReadOf). */
  async checksFromFirstRead(
    index: number,
    value: unknown,
    machine: MachineRef,
    context: ReadinessContext,
  ): Promise<ReadinessCheck[]> {
    const list = await this.contributors[index].firstRead!.checks(value, machine, context);
    this.learn(index, list);
    return list;
  }

  /** The contributors known to report checks of this kind; empty while none has yet. */
  contributorsOf(kind: string): number[] {
    return [...(this.kinds.get(kind) ?? [])];
  }

  private learn(index: number, list: ReadinessCheck[]): void {
    for (const check of list) {
      const known = this.kinds.get(check.kind);
      if (known) known.add(index);
      else this.kinds.set(check.kind, new Set([index]));
    }
  }
}

import { Injectable, NotFoundException } from '@nestjs/common';
import { ReadinessSummaryRepository } from './readiness-summary.repository.js';
import type { MachineRef, ReadinessCheck, ReadinessContext, ReadinessContributor } from './readiness.js';

/** Domain modules register here on init; the readiness board asks all of them. */
@Injectable()
export class ReadinessRegistry {
  private readonly contributors: ReadinessContributor[] = [];

  constructor(private readonly repo: ReadinessSummaryRepository) {}

  register(contributor: ReadinessContributor): void {
    this.contributors.push(contributor);
  }

  /** Without a context, reads the machine's target set itself and includes the data series. */
  async checksFor(machine: MachineRef, context?: ReadinessContext): Promise<ReadinessCheck[]> {
    if (!context) {
      const set = await this.repo.targetSet(machine.workshopId, machine.targetSetId);
      if (!set) throw new NotFoundException('No such target set in this workshop');
      return this.checksFor(machine, { targets: set.targets, series: true });
    }
    const lists = await Promise.all(this.contributors.map((c) => c.checksFor(machine, context)));
    return lists.flat();
  }
}

import { Injectable } from '@nestjs/common';
import type { MachineRef, ReadinessCheck, ReadinessContributor } from './readiness.js';

/** Domain modules register here on init; the readiness board asks all of them. */
@Injectable()
export class ReadinessRegistry {
  private readonly contributors: ReadinessContributor[] = [];

  register(contributor: ReadinessContributor): void {
    this.contributors.push(contributor);
  }

  async checksFor(machine: MachineRef): Promise<ReadinessCheck[]> {
    const lists = await Promise.all(this.contributors.map((c) => c.checksFor(machine)));
    return lists.flat();
  }
}

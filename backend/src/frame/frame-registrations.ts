import { Injectable, OnModuleInit } from '@nestjs/common';
import { ReadinessRegistry } from '../records/readiness.registry.js';
import { SubjectsRegistry } from '../records/subjects.registry.js';
import { BED_GRID, BedGridsService } from './bed-grids.service.js';
import { DIAGONAL_CHECK, DiagonalChecksService } from './diagonal-checks.service.js';
import { TEST_CUT, TestCutsService } from './test-cuts.service.js';

/** Puts the frame checks on the readiness board and lets evidence attach to them. */
@Injectable()
export class FrameRegistrations implements OnModuleInit {
  constructor(
    private readonly readiness: ReadinessRegistry,
    private readonly subjects: SubjectsRegistry,
    private readonly diagonals: DiagonalChecksService,
    private readonly grids: BedGridsService,
    private readonly cuts: TestCutsService,
  ) {}

  onModuleInit() {
    this.readiness.register({
      checksFor: (machine, context) =>
        Promise.all([
          this.diagonals.readiness(machine, context),
          this.grids.readiness(machine, context),
          this.cuts.readiness(machine, context),
        ]),
    });
    this.subjects.register(DIAGONAL_CHECK, (workshopId, id) => this.diagonals.resolve(workshopId, id));
    this.subjects.register(BED_GRID, (workshopId, id) => this.grids.resolve(workshopId, id));
    this.subjects.register(TEST_CUT, (workshopId, id) => this.cuts.resolve(workshopId, id));
  }
}

import { Module } from '@nestjs/common';
import { MachinesModule } from '../machines/machines.module.js';
import { BedGridsService } from './bed-grids.service.js';
import { DiagonalChecksService } from './diagonal-checks.service.js';
import { FrameRegistrations } from './frame-registrations.js';
import { FrameTargets } from './frame-targets.js';
import { FrameController } from './frame.controller.js';
import { TestCutsService } from './test-cuts.service.js';

/** The machine's frame: diagonal checks (squareness), bed grids (flatness) and test cuts. */
@Module({
  imports: [MachinesModule],
  controllers: [FrameController],
  providers: [FrameTargets, DiagonalChecksService, BedGridsService, TestCutsService, FrameRegistrations],
  exports: [DiagonalChecksService, BedGridsService, TestCutsService],
})
export class FrameModule {}

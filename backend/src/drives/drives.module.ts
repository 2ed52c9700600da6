import { Module } from '@nestjs/common';
import { MachinesModule } from '../machines/machines.module.js';
import { AxesController } from './axes.controller.js';
import { AxesRepository } from './axes.repository.js';
import { AxesService } from './axes.service.js';
import { AxisChecksController } from './axis-checks.controller.js';
import { AxisChecksRepository } from './axis-checks.repository.js';
import { BacklashController } from './backlash.controller.js';
import { BacklashReadinessService } from './backlash-readiness.service.js';
import { BacklashService } from './backlash.service.js';
import { DriveChecksService } from './drive-checks.service.js';
import { DriveTargetsService } from './drive-targets.js';
import { PositioningRunsService } from './positioning-runs.service.js';
import { TestProgramService } from './test-program.service.js';
import { TravelTrialsService } from './travel-trials.service.js';

/** Axes and their drives: steps per mm, travel trials, repeat-and-reverse runs, test programs, speed check, travel envelope. */
@Module({
  imports: [MachinesModule],
  controllers: [AxesController, AxisChecksController, BacklashController],
  providers: [
    AxesRepository,
    AxisChecksRepository,
    AxesService,
    DriveTargetsService,
    TravelTrialsService,
    PositioningRunsService,
    DriveChecksService,
    TestProgramService,
    BacklashService,
    BacklashReadinessService,
  ],
  exports: [AxesService, DriveChecksService, TravelTrialsService, PositioningRunsService],
})
export class DrivesModule {}

import { Module } from '@nestjs/common';
import { MachinesModule } from '../machines/machines.module.js';
import { RailChecksService } from './rail-checks.service.js';
import { RailSweepsService } from './rail-sweeps.service.js';
import { RailsController } from './rails.controller.js';
import { RailsRepository } from './rails.repository.js';
import { RailsService } from './rails.service.js';

/** Rails of a machine, their sweeps, partner parallelism and their readiness checks. */
@Module({
  imports: [MachinesModule],
  controllers: [RailsController],
  providers: [RailsRepository, RailsService, RailSweepsService, RailChecksService],
  exports: [RailsService, RailSweepsService],
})
export class RailsModule {}

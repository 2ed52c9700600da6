import { Module } from '@nestjs/common';
import { MachinesModule } from '../machines/machines.module.js';
import { RailsModule } from '../rails/rails.module.js';
import { BoltDownsController } from './bolt-downs.controller.js';
import { BoltDownsRepository } from './bolt-downs.repository.js';
import { BoltDownsService } from './bolt-downs.service.js';

/** The bolt-down guide: a rail fixed hole by hole, and its final sweep saved as the rail's sweep. */
@Module({
  imports: [MachinesModule, RailsModule],
  controllers: [BoltDownsController],
  providers: [BoltDownsRepository, BoltDownsService],
})
export class BoltDownsModule {}

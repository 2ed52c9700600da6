import { Module } from '@nestjs/common';
import { TargetSetsModule } from '../target-sets/target-sets.module.js';
import { MachinesController } from './machines.controller.js';
import { MachinesRepository } from './machines.repository.js';
import { MachinesService } from './machines.service.js';

@Module({
  imports: [TargetSetsModule],
  controllers: [MachinesController],
  providers: [MachinesRepository, MachinesService],
  exports: [MachinesService, TargetSetsModule],
})
export class MachinesModule {}

import { Module } from '@nestjs/common';
import { MachinesModule } from '../machines/machines.module.js';
import { SafetyController } from './safety.controller.js';
import { SafetyRepository } from './safety.repository.js';
import { SafetyService } from './safety.service.js';

/** The safety walk: the pre-cut checklist of each machine, and the workshop's own items. */
@Module({
  imports: [MachinesModule],
  controllers: [SafetyController],
  providers: [SafetyRepository, SafetyService],
  exports: [SafetyService],
})
export class SafetyModule {}

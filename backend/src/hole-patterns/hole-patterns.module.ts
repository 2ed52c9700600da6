import { Module } from '@nestjs/common';
import { MachinesModule } from '../machines/machines.module.js';
import { RailsModule } from '../rails/rails.module.js';
import { HolePatternsController } from './hole-patterns.controller.js';
import { HolePatternsRepository } from './hole-patterns.repository.js';
import { HolePatternsService } from './hole-patterns.service.js';
import { TemplatesService } from './templates.service.js';

/** Drilling patterns of a machine and true-scale templates of them and of its rails. */
@Module({
  imports: [MachinesModule, RailsModule],
  controllers: [HolePatternsController],
  providers: [HolePatternsRepository, HolePatternsService, TemplatesService],
  exports: [HolePatternsService],
})
export class HolePatternsModule {}

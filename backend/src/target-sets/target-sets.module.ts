import { Module } from '@nestjs/common';
import { TargetSetsController } from './target-sets.controller.js';
import { TargetSetsRepository } from './target-sets.repository.js';
import { TargetSetsService } from './target-sets.service.js';

@Module({
  controllers: [TargetSetsController],
  providers: [TargetSetsRepository, TargetSetsService],
  exports: [TargetSetsService],
})
export class TargetSetsModule {}

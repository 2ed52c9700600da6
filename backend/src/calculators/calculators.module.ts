import { Module } from '@nestjs/common';
import { CalculatorsController } from './calculators.controller.js';
import { CalculatorsService } from './calculators.service.js';
import { EnginePool } from '../engine-worker/engine-pool.js';

@Module({
  controllers: [CalculatorsController],
  providers: [CalculatorsService, EnginePool],
  exports: [CalculatorsService],
})
export class CalculatorsModule {}

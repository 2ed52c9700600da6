import { Module } from '@nestjs/common';
import { CalculatorsController } from './calculators.controller.js';
import { CalculatorsService } from './calculators.service.js';

@Module({
  controllers: [CalculatorsController],
  providers: [CalculatorsService],
  exports: [CalculatorsService],
})
export class CalculatorsModule {}

import { Body, Controller, HttpCode, Post, Query } from '@nestjs/common';
import { CalculatorsService } from './calculators.service.js';
import { BoltDownDto } from './dto/bolt-down.dto.js';
import { DriveCalculationDto } from './dto/drive.dto.js';
import { FlatnessDto } from './dto/flatness.dto.js';
import { ParallelismDto } from './dto/parallelism.dto.js';
import { PositioningDto } from './dto/positioning.dto.js';
import { ScrewSpeedDto } from './dto/screw-speed.dto.js';
import { SquarenessDto } from './dto/squareness.dto.js';
import { StraightnessDto } from './dto/straightness.dto.js';
import { TestCutDto } from './dto/test-cut.dto.js';
import { TravelEnvelopeDto } from './dto/travel-envelope.dto.js';
import { TravelTrialDto } from './dto/travel-trial.dto.js';

/**
 * Calculations without saving anything: any signed-in role (the global guard refuses anonymous
 * callers). Straightness and flatness send each point's residual with `?residuals=true` (and,
 * unasked, for small inputs only).
 */
@Controller('calc')
export class CalculatorsController {
  constructor(private readonly calc: CalculatorsService) {}

  @Post('straightness')
  @HttpCode(200)
  straightness(@Body() dto: StraightnessDto, @Query('residuals') residuals?: string) {
    return this.calc.straightness(dto, residuals);
  }

  @Post('parallelism')
  @HttpCode(200)
  parallelism(@Body() dto: ParallelismDto) {
    return this.calc.parallelism(dto);
  }

  @Post('squareness')
  @HttpCode(200)
  squareness(@Body() dto: SquarenessDto) {
    return this.calc.squareness(dto);
  }

  @Post('flatness')
  @HttpCode(200)
  flatness(@Body() dto: FlatnessDto, @Query('residuals') residuals?: string) {
    return this.calc.flatness(dto, residuals);
  }

  @Post('drive')
  @HttpCode(200)
  drive(@Body() dto: DriveCalculationDto) {
    return this.calc.drive(dto);
  }

  @Post('travel-trial')
  @HttpCode(200)
  travelTrial(@Body() dto: TravelTrialDto) {
    return this.calc.travelTrial(dto);
  }

  @Post('positioning')
  @HttpCode(200)
  positioning(@Body() dto: PositioningDto) {
    return this.calc.positioning(dto);
  }

  @Post('screw-speed')
  @HttpCode(200)
  screwSpeed(@Body() dto: ScrewSpeedDto) {
    return this.calc.screwSpeed(dto);
  }

  @Post('bolt-down')
  @HttpCode(200)
  boltDown(@Body() dto: BoltDownDto) {
    return this.calc.boltDown(dto);
  }

  @Post('travel-envelope')
  @HttpCode(200)
  travelEnvelope(@Body() dto: TravelEnvelopeDto) {
    return this.calc.travelEnvelope(dto);
  }

  @Post('test-cut')
  @HttpCode(200)
  testCut(@Body() dto: TestCutDto) {
    return this.calc.testCut(dto);
  }
}

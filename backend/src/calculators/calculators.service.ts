import { Injectable } from '@nestjs/common';
import { boltDownGuide, planHoles } from '../engine/bolt-down.js';
import { EngineInputError } from '../engine/engine-input-error.js';
import { evaluatePositioning } from '../engine/positioning.js';
import { evaluateScrewSpeed } from '../engine/screw-speed.js';
import { evaluateSquareness } from '../engine/squareness.js';
import { evaluateDrive } from '../engine/steps-per-mm.js';
import { evaluateTestCut } from '../engine/test-cut.js';
import { evaluateTravelEnvelope } from '../engine/travel-envelope.js';
import { evaluateTravelTrial } from '../engine/travel-trial.js';
import { arrayToMm, parseLengthUnit, toMm } from '../engine/units.js';
import { EnginePool } from '../engine-worker/engine-pool.js';
import * as map from './calculators.mapper.js';
import { residualsWanted } from './residuals-option.js';
import type { BoltDownDto } from './dto/bolt-down.dto.js';
import type { DriveDto } from './dto/drive.dto.js';
import type { FlatnessDto } from './dto/flatness.dto.js';
import type { ParallelismDto } from './dto/parallelism.dto.js';
import type { PositioningDto } from './dto/positioning.dto.js';
import type { ScrewSpeedDto } from './dto/screw-speed.dto.js';
import type { SquarenessDto } from './dto/squareness.dto.js';
import type { StraightnessDto } from './dto/straightness.dto.js';
import type { TestCutDto } from './dto/test-cut.dto.js';
import type { TravelEnvelopeDto } from './dto/travel-envelope.dto.js';
import type { TravelTrialDto } from './dto/travel-trial.dto.js';

/**
 * Stateless calculations: converts readings from the request's unit to mm, runs the engine and
 * maps its result. Nothing is stored. Engine input errors become 400s through the global filter.
 * The calculations that take long lists go through the engine pool (large ones in a worker thread).
 */
@Injectable()
export class CalculatorsService {
  constructor(private readonly engine: EnginePool) {}

  async straightness(dto: StraightnessDto, residuals?: string) {
    const unit = parseLengthUnit(dto.unit);
    const withResiduals = residualsWanted(residuals, dto.positions.length);
    const result = await this.engine.run({ kind: 'straightness', input: { positionsMm: dto.positions, readingsMm: arrayToMm(dto.readings, unit) } });
    return map.toStraightnessResponse(result, withResiduals);
  }

  async parallelism(dto: ParallelismDto) {
    const unit = parseLengthUnit(dto.unit);
    return map.toParallelismResponse(
      await this.engine.run({ kind: 'parallelism', input: { positionsMm: dto.positions, railAMm: arrayToMm(dto.railA, unit), railBMm: arrayToMm(dto.railB, unit) } }),
    );
  }

  squareness(dto: SquarenessDto) {
    return map.toSquarenessResponse(
      evaluateSquareness({
        sideXMm: dto.sideX,
        sideYMm: dto.sideY,
        diagonal1Mm: dto.diagonal1,
        diagonal2Mm: dto.diagonal2,
        gantrySpanMm: dto.gantrySpan,
      }),
    );
  }

  async flatness(dto: FlatnessDto, residuals?: string) {
    const unit = parseLengthUnit(dto.unit);
    const withResiduals = residualsWanted(residuals, dto.points.length);
    const result = await this.engine.run({ kind: 'flatness', input: dto.points.map((p) => ({ xMm: p.x, yMm: p.y, zMm: toMm(p.z, unit) })) });
    return map.toFlatnessResponse(result, withResiduals);
  }

  drive(dto: DriveDto) {
    return map.toDriveResponse(
      evaluateDrive({
        type: dto.type,
        motorStepsPerRev: dto.motorStepsPerRev,
        microsteps: dto.microsteps,
        gearRatio: dto.gearRatio,
        leadMm: dto.lead,
        beltPitchMm: dto.beltPitch,
        pulleyTeeth: dto.pulleyTeeth,
        pinionTeeth: dto.pinionTeeth,
        pinionModuleMm: dto.pinionModule,
      }),
    );
  }

  travelTrial(dto: TravelTrialDto) {
    const unit = parseLengthUnit(dto.unit);
    return map.toTravelTrialResponse(
      evaluateTravelTrial({
        stepsPerMmUsed: dto.stepsPerMmUsed,
        moves: dto.moves.map((m) => ({ commandedMm: m.commanded, measuredMm: toMm(m.measured, unit) })),
        throughOrigin: dto.throughOrigin,
      }),
    );
  }

  positioning(dto: PositioningDto) {
    const unit = parseLengthUnit(dto.unit);
    return map.toPositioningResponse(
      evaluatePositioning({
        targetsMm: dto.targets,
        runs: dto.runs.map((r) => ({ direction: r.direction, deviationsMm: arrayToMm(r.deviations, unit) })),
      }),
    );
  }

  screwSpeed(dto: ScrewSpeedDto) {
    return map.toScrewSpeedResponse(
      evaluateScrewSpeed({
        nominalDiameterMm: dto.nominalDiameter,
        rootDiameterMm: dto.rootDiameter,
        unsupportedLengthMm: dto.unsupportedLength,
        leadMm: dto.lead,
        mounting: dto.mounting,
        feedRateMmPerMin: dto.feedRate,
        dnLimit: dto.dnLimit,
      }),
    );
  }

  boltDown(dto: BoltDownDto) {
    const unit = parseLengthUnit(dto.unit);
    const plan = planHoles({ lengthMm: dto.length, pitchMm: dto.pitch, firstHoleOffsetMm: dto.firstHoleOffset });
    const readings = new Map<number, number>();
    for (const r of dto.readings ?? []) {
      if (r.hole >= plan.positionsMm.length) {
        throw new EngineInputError(`readings names hole ${r.hole}, but the rail has holes 0 to ${plan.positionsMm.length - 1}`, 'readings');
      }
      if (readings.has(r.hole)) throw new EngineInputError(`readings gives hole ${r.hole} twice`, 'readings');
      readings.set(r.hole, toMm(r.reading, unit));
    }
    const guide = boltDownGuide(plan, dto.mode ?? 'line', readings);
    return map.toBoltDownResponse(plan.positionsMm, guide.steps, guide.nextHole);
  }

  travelEnvelope(dto: TravelEnvelopeDto) {
    return map.toTravelEnvelopeResponse(
      evaluateTravelEnvelope({
        axes: dto.axes.map((a) => ({ axis: a.axis, measuredTravelMm: a.measuredTravel, workSizeMm: a.workSize })),
        marginPerSideMm: dto.marginPerSide,
      }),
    );
  }

  testCut(dto: TestCutDto) {
    return map.toTestCutResponse(
      evaluateTestCut({
        x: { commandedMm: dto.x.commanded, measuredMm: dto.x.measured },
        y: { commandedMm: dto.y.commanded, measuredMm: dto.y.measured },
        stepsPerMmX: dto.stepsPerMmX,
        stepsPerMmY: dto.stepsPerMmY,
        diagonal1Mm: dto.diagonal1,
        diagonal2Mm: dto.diagonal2,
        gantrySpanMm: dto.gantrySpan,
        circle: dto.circle
          ? { commandedDiameterMm: dto.circle.commandedDiameter, measuredXMm: dto.circle.measuredX, measuredYMm: dto.circle.measuredY }
          : undefined,
        ovalityToleranceMm: dto.ovalityTolerance,
      }),
    );
  }
}

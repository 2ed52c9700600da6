import { BadRequestException, Injectable } from '@nestjs/common';
import { boltDownGuide, planHoles } from '../engine/bolt-down.js';
import { EngineInputError } from '../engine/engine-input-error.js';
import { evaluatePositioning } from '../engine/positioning.js';
import { evaluateScrewSpeed } from '../engine/screw-speed.js';
import { evaluateSquareness } from '../engine/squareness.js';
import { evaluateDrive } from '../engine/steps-per-mm.js';
import { evaluateTestCut } from '../engine/test-cut.js';
import { evaluateTravelEnvelope } from '../engine/travel-envelope.js';
import { evaluateTravelTrial } from '../engine/travel-trial.js';
import { arrayToMm, toMm } from '../engine/units.js';
import { EnginePool } from '../engine-worker/engine-pool.js';
import * as map from './calculators.mapper.js';
import { residualsWanted } from './residuals-option.js';
import { unitsOf } from './units-of.js';
import type { BoltDownDto } from './dto/bolt-down.dto.js';
import type { DriveCalculationDto } from './dto/drive.dto.js';
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
 * Stateless calculations: converts the request's lengths (lengthUnit) and readings (readingUnit)
 * to mm, runs the engine and maps its result, which is in mm whatever came in and names its
 * units. Nothing is stored. Engine input errors become 400s through the global filter. The
 * calculations that take long lists go through the engine pool (large ones in a worker thread).
 */
@Injectable()
export class CalculatorsService {
  constructor(private readonly engine: EnginePool) {}

  async straightness(dto: StraightnessDto, residuals?: string) {
    const u = unitsOf(dto);
    const withResiduals = residualsWanted(residuals, dto.positions.length);
    const result = await this.engine.run({
      kind: 'straightness',
      input: {
        positionsMm: arrayToMm(dto.positions, u.lengthUnit),
        readingsMm: arrayToMm(dto.readings, u.readingUnit),
      },
      residuals: withResiduals,
    });
    return map.toStraightnessResponse(result, withResiduals, u);
  }

  async parallelism(dto: ParallelismDto) {
    const u = unitsOf(dto);
    const result = await this.engine.run({
      kind: 'parallelism',
      input: {
        positionsMm: arrayToMm(dto.positions, u.lengthUnit),
        railAMm: arrayToMm(dto.railA, u.readingUnit),
        railBMm: arrayToMm(dto.railB, u.readingUnit),
      },
    });
    return map.toParallelismResponse(result, u);
  }

  squareness(dto: SquarenessDto) {
    const u = unitsOf(dto);
    const mm = (v: number) => toMm(v, u.lengthUnit);
    const result = evaluateSquareness({
      sideXMm: mm(dto.sideX),
      sideYMm: mm(dto.sideY),
      diagonal1Mm: mm(dto.diagonal1),
      diagonal2Mm: mm(dto.diagonal2),
      gantrySpanMm: dto.gantrySpan == null ? undefined : mm(dto.gantrySpan),
    });
    return map.toSquarenessResponse(result, u, dto.gantrySpan == null);
  }

  async flatness(dto: FlatnessDto, residuals?: string) {
    const u = unitsOf(dto);
    const withResiduals = residualsWanted(residuals, dto.points.length);
    const result = await this.engine.run({
      kind: 'flatness',
      input: dto.points.map((p) => ({
        xMm: toMm(p.x, u.lengthUnit),
        yMm: toMm(p.y, u.lengthUnit),
        zMm: toMm(p.z, u.readingUnit),
      })),
    });
    return map.toFlatnessResponse(result, withResiduals, u);
  }

  drive(dto: DriveCalculationDto) {
    const u = unitsOf(dto);
    const mm = (v: number | undefined) => (v == null ? undefined : toMm(v, u.lengthUnit));
    if (dto.lead != null && dto.threadsPerInch != null) {
      throw new BadRequestException(['give lead or threadsPerInch, not both']);
    }
    if (dto.threadsPerInch != null && !(dto.threadsPerInch > 0)) {
      throw new BadRequestException(['threadsPerInch must be greater than 0']);
    }
    // One inch of thread holds `threadsPerInch` turns: the lead of a single-start screw is 1 in ÷ TPI.
    const leadMm = dto.threadsPerInch != null ? toMm(1, 'in') / dto.threadsPerInch : mm(dto.lead);
    const result = evaluateDrive({
      type: dto.type,
      motorStepsPerRev: dto.motorStepsPerRev,
      microsteps: dto.microsteps,
      gearRatio: dto.gearRatio,
      leadMm,
      beltPitchMm: mm(dto.beltPitch),
      pulleyTeeth: dto.pulleyTeeth,
      pinionTeeth: dto.pinionTeeth,
      // The module is a length in mm by definition (ISO 54), whatever unit the rest is in.
      pinionModuleMm: dto.pinionModule,
    });
    return map.toDriveResponse(result, u);
  }

  travelTrial(dto: TravelTrialDto) {
    const u = unitsOf(dto);
    const result = evaluateTravelTrial({
      stepsPerMmUsed: dto.stepsPerMmUsed,
      moves: dto.moves.map((m) => ({
        commandedMm: toMm(m.commanded, u.lengthUnit),
        measuredMm: toMm(m.measured, u.lengthUnit),
      })),
      throughOrigin: dto.throughOrigin,
    });
    const expected = dto.theoreticalStepsPerMm ?? dto.stepsPerMmUsed;
    return map.toTravelTrialResponse(result, u, {
      expected,
      expectedLabel: dto.theoreticalStepsPerMm != null ? 'worked out from the drive' : 'in use',
    });
  }

  positioning(dto: PositioningDto) {
    const u = unitsOf(dto);
    const result = evaluatePositioning({
      targetsMm: arrayToMm(dto.targets, u.lengthUnit),
      runs: dto.runs.map((r) => ({ direction: r.direction, deviationsMm: arrayToMm(r.deviations, u.readingUnit) })),
    });
    return map.toPositioningResponse(result, u);
  }

  screwSpeed(dto: ScrewSpeedDto) {
    const u = unitsOf(dto);
    const mm = (v: number) => toMm(v, u.lengthUnit);
    const result = evaluateScrewSpeed({
      nominalDiameterMm: mm(dto.nominalDiameter),
      rootDiameterMm: mm(dto.rootDiameter),
      unsupportedLengthMm: mm(dto.unsupportedLength),
      leadMm: mm(dto.lead),
      mounting: dto.mounting,
      feedRateMmPerMin: mm(dto.feedRate),
      dnLimit: dto.dnLimit,
    });
    return map.toScrewSpeedResponse(result, u);
  }

  boltDown(dto: BoltDownDto) {
    const u = unitsOf(dto);
    const mm = (v: number) => toMm(v, u.lengthUnit);
    const plan = planHoles({
      lengthMm: mm(dto.length),
      pitchMm: mm(dto.pitch),
      firstHoleOffsetMm: mm(dto.firstHoleOffset),
    });
    const readings = new Map<number, number>();
    for (const r of dto.readings ?? []) {
      if (r.hole >= plan.positionsMm.length) {
        throw new EngineInputError(
          `readings names hole ${r.hole}, but the rail has holes 0 to ${plan.positionsMm.length - 1}`,
          'readings',
        );
      }
      if (readings.has(r.hole)) throw new EngineInputError(`readings gives hole ${r.hole} twice`, 'readings');
      readings.set(r.hole, toMm(r.reading, u.readingUnit));
    }
    const guide = boltDownGuide(plan, dto.mode ?? 'line', readings);
    return map.toBoltDownResponse(plan.positionsMm, guide.steps, guide.nextHole, u);
  }

  travelEnvelope(dto: TravelEnvelopeDto) {
    const u = unitsOf(dto);
    const mm = (v: number) => toMm(v, u.lengthUnit);
    const result = evaluateTravelEnvelope({
      axes: dto.axes.map((a) => ({ axis: a.axis, measuredTravelMm: mm(a.measuredTravel), workSizeMm: mm(a.workSize) })),
      marginPerSideMm: dto.marginPerSide == null ? undefined : mm(dto.marginPerSide),
    });
    return map.toTravelEnvelopeResponse(result, u);
  }

  testCut(dto: TestCutDto) {
    const u = unitsOf(dto);
    const mm = (v: number) => toMm(v, u.lengthUnit);
    const opt = (v: number | undefined) => (v == null ? undefined : mm(v));
    const result = evaluateTestCut({
      x: { commandedMm: mm(dto.x.commanded), measuredMm: mm(dto.x.measured) },
      y: { commandedMm: mm(dto.y.commanded), measuredMm: mm(dto.y.measured) },
      stepsPerMmX: dto.stepsPerMmX,
      stepsPerMmY: dto.stepsPerMmY,
      diagonal1Mm: opt(dto.diagonal1),
      diagonal2Mm: opt(dto.diagonal2),
      gantrySpanMm: opt(dto.gantrySpan),
      circle: dto.circle
        ? {
            commandedDiameterMm: mm(dto.circle.commandedDiameter),
            measuredXMm: mm(dto.circle.measuredX),
            measuredYMm: mm(dto.circle.measuredY),
          }
        : undefined,
      ovalityToleranceMm: opt(dto.ovalityTolerance),
    });
    return map.toTestCutResponse(result, u, {
      stepsPerMmX: dto.stepsPerMmX,
      stepsPerMmY: dto.stepsPerMmY,
      spanAssumed: dto.gantrySpan == null,
    });
  }
}

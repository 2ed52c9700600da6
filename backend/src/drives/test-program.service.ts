import { BadRequestException, Injectable } from '@nestjs/common';
import type { SessionUser } from '../auth/session-user.js';
import { fromMm, isLengthUnit, toMm, type LengthUnit } from '../engine/units.js';
import { MachinesService } from '../machines/machines.service.js';
import { AxesService } from './axes.service.js';
import type { AxisRow } from './axes.repository.js';
import { axisLetter } from './drive-record.js';
import type { TestProgramQuery, TestTargetsQuery } from './dto/test-program.query.js';
import {
  defaultTargets,
  inUnit,
  positioningProgram,
  programText,
  travelTrialProgram,
  type ProgramUnit,
} from './test-program.js';

export const DEFAULT_OVERRUN_MM = 5;
export const DEFAULT_RUNS = 5;
export const DEFAULT_DWELL_S = 4;
/** Measuring moves go slower than cutting moves; capped by the axis's fastest feed. */
export const DEFAULT_TEST_FEED_MM_PER_MIN = 1000;

/** The targets a repeat-and-reverse run reads at: the program and the entry grid use the same list. */
export interface TestTargets {
  /** The unit the axis is set up in (and `targets` and `overrun` are given in). */
  lengthUnit: LengthUnit;
  /** Target positions, in `lengthUnit`. */
  targets: number[];
  targetsMm: number[];
  /** Clear travel kept beyond the first and last target, in `lengthUnit`. */
  overrun: number;
  overrunMm: number;
  /** Count of runs in each direction. */
  runs: number;
  /** Why the list is empty (no measured travel), otherwise null. */
  reason: string | null;
  source: string;
}

const TARGETS_SOURCE =
  'ISO 230-2 practice (from memory): at least 5 targets, about 5 per metre, unevenly spaced so periodic errors are not sampled at one phase, 5 runs each way; an overrun of clear travel kept beyond the first and last target for the reversal.';

/** An axis set up in inches or thou gets a program in inches (G20); any metric unit gets G21. */
export const programUnitOf = (axisUnit: LengthUnit): ProgramUnit =>
  axisUnit === 'in' || axisUnit === 'thou' ? 'in' : 'mm';
const axisUnitOf = (axis: AxisRow): LengthUnit => (isLengthUnit(axis.lengthUnit) ? axis.lengthUnit : 'mm');
const tidy = (v: number) => Math.round(v * 1e6) / 1e6;

/** The default targets of an axis in its own unit, rounded to a tenth of that unit, and in mm. */
function targetsOver(travelMm: number, overrunMm: number, axisUnit: ProgramUnit): number[] {
  const lo = inUnit(overrunMm * 2, axisUnit);
  const hi = inUnit(travelMm - overrunMm * 2, axisUnit);
  return defaultTargets(lo, hi).map((t) => toMm(t, axisUnit));
}

@Injectable()
export class TestProgramService {
  constructor(
    private readonly axes: AxesService,
    private readonly machines: MachinesService,
  ) {}

  /** GET /api/axes/:id/test-targets: the default targets of the repeat-and-reverse program and grid. */
  async targets(actor: SessionUser, axisId: string, q: TestTargetsQuery = {}): Promise<TestTargets> {
    const axis = await this.axes.findRow(actor, axisId);
    const unit = axisUnitOf(axis);
    const overrunMm = q.overrun === undefined ? DEFAULT_OVERRUN_MM : toMm(q.overrun, q.lengthUnit ?? 'mm');
    if (!(overrunMm > 0)) throw new BadRequestException(['overrun must be greater than zero (in lengthUnit)']);
    const travel = axis.measuredTravelMm;
    const base = {
      lengthUnit: unit,
      overrun: tidy(fromMm(overrunMm, unit)),
      overrunMm,
      runs: DEFAULT_RUNS,
      source: TARGETS_SOURCE,
    };
    if (travel == null || travel <= overrunMm * 4) {
      const reason =
        travel == null
          ? 'The axis has no measured travel: record it, or type the targets.'
          : `The measured travel of ${tidy(fromMm(travel, unit))} ${unit} leaves no room for targets with an overrun of ${base.overrun} ${unit}.`;
      return { ...base, targets: [], targetsMm: [], reason };
    }
    const targetsMm = targetsOver(travel, overrunMm, programUnitOf(unit));
    return { ...base, targets: targetsMm.map((t) => tidy(fromMm(t, unit))), targetsMm, reason: null };
  }

  async program(actor: SessionUser, axisId: string, q: TestProgramQuery): Promise<{ filename: string; text: string }> {
    const axis = await this.axes.findRow(actor, axisId);
    const machine = await this.machines.getRef(actor, axis.machineId);
    const qu: LengthUnit = q.lengthUnit ?? 'mm';
    const unit = programUnitOf(axisUnitOf(axis));
    const mm = (v: number) => toMm(v, qu);
    const shown = (vMm: number) => `${tidy(fromMm(vMm, qu))} ${qu}`;
    const problems: string[] = [];
    const letter = (q.letter ?? axisLetter(axis.name))?.toUpperCase();
    if (!letter)
      problems.push(
        `letter is needed: the axis name ${programText(axis.name)} does not start with an axis letter (X, Y, Z…)`,
      );
    const feedMm =
      q.feed === undefined
        ? Math.min(DEFAULT_TEST_FEED_MM_PER_MIN, axis.maxFeedRateMmPerMin ?? DEFAULT_TEST_FEED_MM_PER_MIN)
        : mm(q.feed);
    if (!(feedMm > 0)) problems.push(`feed must be greater than zero (${qu}/min)`);
    if (axis.maxFeedRateMmPerMin && feedMm > axis.maxFeedRateMmPerMin * (1 + 1e-9))
      problems.push(`feed must not exceed the axis's fastest feed of ${shown(axis.maxFeedRateMmPerMin)}/min`);
    const overrun = q.overrun === undefined ? DEFAULT_OVERRUN_MM : mm(q.overrun);
    if (!(overrun > 0))
      problems.push(
        `overrun must be greater than zero (${qu}): the axis has to pass the target and come back to approach it from its side`,
      );
    const dwell = q.dwell ?? DEFAULT_DWELL_S;
    if (!(dwell >= 0) || dwell > 600) problems.push('dwell must be from 0 to 600 seconds');
    const travel = axis.measuredTravelMm;
    const date = new Date().toISOString().slice(0, 10);
    const safe = (s: string) =>
      s
        .replace(/[^A-Za-z0-9]+/g, '-')
        .replace(/^-|-$/g, '')
        .toLowerCase();
    const filename = `${safe(machine.name) || 'machine'}-${safe(axis.name) || 'axis'}-${q.kind === 'travel' ? 'travel-trial' : 'repeat-and-reverse'}.${q.format ?? 'nc'}`;
    const base = { machine: machine.name, axis: axis.name, letter: letter ?? 'X', date, unit };
    const u = unit === 'in' ? 'in' : 'mm';
    const inProgram = (vMm: number) => tidy(inUnit(vMm, unit));
    const notes = q.notes ? [`Notes: ${q.notes}`] : [];
    const feedShown = unit === 'in' ? Math.round(inUnit(feedMm, 'in') * 10) / 10 : Math.round(feedMm);

    const inside = (field: string, values: number[]) => {
      for (const v of values) {
        if (v < -1e-9) problems.push(`${field} takes the axis to ${shown(v)}, below 0 of its work coordinates`);
        else if (travel != null && v > travel + 1e-9)
          problems.push(`${field} takes the axis to ${shown(v)}, beyond its measured travel of ${shown(travel)}`);
        else continue;
        break;
      }
    };

    if (q.kind === 'travel') {
      const start = q.start === undefined ? overrun : mm(q.start);
      let distances: number[] = [];
      if (q.distances) distances = list('distances', q.distances, qu).map(mm);
      else if (travel != null) {
        const usable = inUnit(travel - start - overrun, unit);
        const step = unit === 'in' ? 0.5 : 10;
        distances = [0.25, 0.5, 0.75, 1]
          .map((f) => toMm(Math.floor((usable * f) / step) * step, unit))
          .filter((d) => d > 0);
      } else
        problems.push(
          `distances is required when the axis has no measured travel (for example distances=100,200,300 in ${qu})`,
        );
      if (q.distances !== undefined && distances.some((d) => d <= 0))
        problems.push(`distances must all be greater than zero (${qu})`);
      if (!problems.length) inside('start less the overrun', [start - overrun]);
      if (!problems.length)
        inside(
          'distances',
          distances.map((d) => start + d),
        );
      if (problems.length) throw new BadRequestException(problems);
      const text = travelTrialProgram({
        ...base,
        title: 'travel trial',
        startMm: start,
        distancesMm: distances,
        overrunMm: overrun,
        feedMmPerMin: feedMm,
        dwellS: dwell,
        lowestMm: start - overrun,
        highestMm: start + Math.max(...distances),
        lines: [
          `Start: ${inProgram(start)} ${u}  Distances ${u}: ${distances.map(inProgram).join(', ')}`,
          `Feed: ${feedShown} ${u}/min  Backlash take-up overrun: ${inProgram(overrun)} ${u}`,
          `Steps per mm in use: ${axis.stepsPerMm}`,
          `Switch optional stop on: M1 stops at the start and at each distance for the measurement. With it off the axis waits ${dwell} s.`,
          ...notes,
        ],
      });
      return { filename, text };
    }

    const runs = q.runs ?? DEFAULT_RUNS;
    if (!Number.isInteger(runs) || runs < 2 || runs > 20)
      problems.push('runs must be a whole number from 2 to 20 (ISO 230-2 asks for 5 each way)');
    let targets: number[] = [];
    if (q.targets) targets = list('targets', q.targets, qu).map(mm);
    else if (travel != null && overrun > 0) targets = targetsOver(travel, overrun, unit);
    else if (travel == null)
      problems.push(
        `targets is required when the axis has no measured travel (for example targets=10,110,215 in ${qu})`,
      );
    if (targets.length && targets.length < 2)
      problems.push('targets needs at least 2 positions (ISO 230-2 asks for 5 or more)');
    for (let i = 1; i < targets.length; i++) {
      if (!(targets[i] > targets[i - 1])) {
        problems.push(
          `targets must rise along the axis (targets[${i}] = ${shown(targets[i])} is not above ${shown(targets[i - 1])})`,
        );
        break;
      }
    }
    if (!problems.length)
      inside('targets with the overrun', [targets[0] - overrun, targets[targets.length - 1] + overrun]);
    if (problems.length) throw new BadRequestException(problems);
    const text = positioningProgram({
      ...base,
      title: 'repeat-and-reverse run, ISO 230-2 linear cycle',
      targetsMm: targets,
      runs,
      overrunMm: overrun,
      feedMmPerMin: feedMm,
      dwellS: dwell,
      lowestMm: targets[0] - overrun,
      highestMm: targets[targets.length - 1] + overrun,
      lines: [
        `Targets ${u}: ${targets.map(inProgram).join(', ')}`,
        `Runs: ${runs} up and ${runs} down  Overrun: ${inProgram(overrun)} ${u}`,
        `Feed: ${feedShown} ${u}/min  Dwell at each target: ${dwell} s`,
        `Switch optional stop on: M1 stops at each target for the reading. With it off the axis waits ${dwell} s.`,
        ...notes,
      ],
    });
    return { filename, text };
  }
}

function list(field: string, text: string, unit: LengthUnit): number[] {
  const values = text.split(',').map((s) => Number(s.trim()));
  values.forEach((v, i) => {
    if (!Number.isFinite(v)) throw new BadRequestException([`${field}[${i}] must be a number (${unit})`]);
  });
  return values;
}

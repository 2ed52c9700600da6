import { BadRequestException, Injectable } from '@nestjs/common';
import type { SessionUser } from '../auth/session-user.js';
import { MachinesService } from '../machines/machines.service.js';
import { AxesService } from './axes.service.js';
import { axisLetter } from './drive-record.js';
import type { TestProgramQuery } from './dto/test-program.query.js';
import { defaultTargets, positioningProgram, travelTrialProgram } from './test-program.js';

export const DEFAULT_OVERRUN_MM = 5;
export const DEFAULT_RUNS = 5;
export const DEFAULT_DWELL_S = 4;
/** Measuring moves go slower than cutting moves; capped by the axis's fastest feed. */
export const DEFAULT_TEST_FEED_MM_PER_MIN = 1000;

function list(field: string, text: string): number[] {
  const values = text.split(',').map((s) => Number(s.trim()));
  values.forEach((v, i) => {
    if (!Number.isFinite(v)) throw new BadRequestException([`${field}[${i}] must be a number of mm`]);
  });
  return values;
}

@Injectable()
export class TestProgramService {
  constructor(
    private readonly axes: AxesService,
    private readonly machines: MachinesService,
  ) {}

  async program(actor: SessionUser, axisId: string, q: TestProgramQuery): Promise<{ filename: string; text: string }> {
    const axis = await this.axes.findRow(actor, axisId);
    const machine = await this.machines.getRef(actor, axis.machineId);
    const problems: string[] = [];
    const letter = (q.letter ?? axisLetter(axis.name))?.toUpperCase();
    if (!letter) problems.push(`letter is needed: the axis name ${axis.name} does not start with an axis letter (X, Y, Z…)`);
    const feed = q.feed ?? Math.min(DEFAULT_TEST_FEED_MM_PER_MIN, axis.maxFeedRateMmPerMin ?? DEFAULT_TEST_FEED_MM_PER_MIN);
    if (!(feed > 0)) problems.push('feed must be greater than zero (mm/min)');
    if (axis.maxFeedRateMmPerMin && feed > axis.maxFeedRateMmPerMin) problems.push(`feed must not exceed the axis's fastest feed of ${axis.maxFeedRateMmPerMin} mm/min`);
    const overrun = q.overrun ?? DEFAULT_OVERRUN_MM;
    if (!(overrun > 0)) problems.push('overrun must be greater than zero (mm): the axis has to pass the target and come back to approach it from its side');
    const travel = axis.measuredTravelMm;
    const date = new Date().toISOString().slice(0, 10);
    const base = { machine: machine.name, axis: axis.name, letter: letter ?? 'X', date };
    const safe = (s: string) => s.replace(/[^A-Za-z0-9]+/g, '-').replace(/^-|-$/g, '').toLowerCase();
    const filename = `${safe(machine.name)}-${safe(axis.name)}-${q.kind === 'travel' ? 'travel-trial' : 'repeat-and-reverse'}.${q.format ?? 'nc'}`;

    const inside = (field: string, values: number[]) => {
      for (const v of values) {
        if (v < 0) problems.push(`${field} takes the axis to ${v.toFixed(3)} mm, below 0 mm of its work coordinates`);
        else if (travel != null && v > travel) problems.push(`${field} takes the axis to ${v.toFixed(3)} mm, beyond its measured travel of ${travel} mm`);
        else continue;
        break;
      }
    };

    if (q.kind === 'travel') {
      const start = q.start ?? overrun;
      let distances: number[] = [];
      if (q.distances) distances = list('distances', q.distances);
      else if (travel != null) {
        const usable = travel - start - overrun;
        distances = [0.25, 0.5, 0.75, 1].map((f) => Math.floor((usable * f) / 10) * 10).filter((d) => d > 0);
      } else problems.push('distances is required when the axis has no measured travel (for example distances=100,200,300)');
      if (q.distances !== undefined && distances.some((d) => d <= 0)) problems.push('distances must all be greater than zero (mm)');
      if (!problems.length) inside('start less the overrun', [start - overrun]);
      if (!problems.length) inside('distances', distances.map((d) => start + d));
      if (problems.length) throw new BadRequestException(problems);
      const text = travelTrialProgram({
        ...base,
        title: 'travel trial',
        startMm: start,
        distancesMm: distances,
        overrunMm: overrun,
        feedMmPerMin: feed,
        lines: [`Start: ${start} mm  Distances mm: ${distances.join(', ')}`, `Feed: ${Math.round(feed)} mm/min  Backlash take-up overrun: ${overrun} mm`, `Steps per mm in use: ${axis.stepsPerMm}`],
      });
      return { filename, text };
    }

    const runs = q.runs ?? DEFAULT_RUNS;
    if (!Number.isInteger(runs) || runs < 2 || runs > 20) problems.push('runs must be a whole number from 2 to 20 (ISO 230-2 asks for 5 each way)');
    const dwell = q.dwell ?? DEFAULT_DWELL_S;
    if (!(dwell >= 0) || dwell > 600) problems.push('dwell must be from 0 to 600 seconds');
    let targets: number[] = [];
    if (q.targets) targets = list('targets', q.targets);
    else if (travel != null) targets = defaultTargets(overrun * 2, travel - overrun * 2);
    else problems.push('targets is required when the axis has no measured travel (for example targets=10,110,215)');
    if (targets.length && targets.length < 2) problems.push('targets needs at least 2 positions (ISO 230-2 asks for 5 or more)');
    for (let i = 1; i < targets.length; i++) {
      if (!(targets[i] > targets[i - 1])) {
        problems.push(`targets must rise along the axis (targets[${i}] = ${targets[i]} is not above ${targets[i - 1]})`);
        break;
      }
    }
    if (!problems.length) inside('targets with the overrun', [targets[0] - overrun, targets[targets.length - 1] + overrun]);
    if (problems.length) throw new BadRequestException(problems);
    const text = positioningProgram({
      ...base,
      title: 'repeat-and-reverse run, ISO 230-2 linear cycle',
      targetsMm: targets,
      runs,
      overrunMm: overrun,
      feedMmPerMin: feed,
      dwellS: dwell,
      lines: [`Targets mm: ${targets.join(', ')}`, `Runs: ${runs} up and ${runs} down  Overrun: ${overrun} mm`, `Feed: ${Math.round(feed)} mm/min  Dwell at each target: ${dwell} s`],
    });
    return { filename, text };
  }
}

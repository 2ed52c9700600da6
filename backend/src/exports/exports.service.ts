import { Injectable } from '@nestjs/common';
import type { SessionUser } from '../auth/session-user.js';
import type { LengthUnit } from '../engine/units.js';
import { AxesService } from '../drives/axes.service.js';
import { PositioningRunsService } from '../drives/positioning-runs.service.js';
import { TravelTrialsService } from '../drives/travel-trials.service.js';
import { BedGridsService } from '../frame/bed-grids.service.js';
import { MachinesService } from '../machines/machines.service.js';
import { RailSweepsService } from '../rails/rail-sweeps.service.js';
import { RailsService } from '../rails/rails.service.js';
import {
  convert,
  csvFile,
  fileName,
  fromMmTo,
  isoTime,
  tidy,
  UNIT_NAMES,
  unitName,
  words,
  type Cell,
} from './csv-file.js';

export interface CsvDownload {
  filename: string;
  content: string;
}

// The owning services read each record, so access, workshop scoping and unreadable records are
// handled exactly as on the pages. A file takes the units of its newest record (what the page
// shows first) and states them in the headers; older records are converted to them exactly.
const PAGE = 200;

@Injectable()
export class ExportsService {
  constructor(
    private readonly rails: RailsService,
    private readonly railSweeps: RailSweepsService,
    private readonly axes: AxesService,
    private readonly trials: TravelTrialsService,
    private readonly runs: PositioningRunsService,
    private readonly machines: MachinesService,
    private readonly grids: BedGridsService,
  ) {}

  /** Every reading of every sweep of a rail, newest sweep first. */
  async sweeps(actor: SessionUser, railId: string): Promise<CsvDownload> {
    const rail = await this.rails.get(actor, railId);
    const list = await this.all((cursor) => this.railSweeps.list(actor, railId, { limit: PAGE, cursor }));
    const full = [];
    for (const s of list) full.push(await this.railSweeps.get(actor, s.id));
    const L: LengthUnit = full[0]?.lengthUnit ?? 'mm';
    const R: LengthUnit = full[0]?.readingUnit ?? 'mm';
    const header = [
      'Sweep',
      'Taken at',
      'Taken by',
      'Phase',
      'Face',
      'Datum',
      'Station',
      `Position (${UNIT_NAMES[L]})`,
      `Reading (${UNIT_NAMES[R]})`,
      `Residual from least-squares line (${UNIT_NAMES[R]})`,
      `Straightness, least squares (${UNIT_NAMES[R]})`,
      `Straightness, minimum zone (${UNIT_NAMES[R]})`,
      'Target',
      'Target unit',
      'Status',
    ];
    const rows: Cell[][] = [];
    for (const s of full) {
      const r = s.result;
      s.stations?.forEach((st, i) =>
        rows.push([
          s.id,
          isoTime(s.takenAt),
          s.takenBy,
          words(s.phase),
          s.face,
          s.datum,
          i + 1,
          fromMmTo(st.positionMm, L),
          fromMmTo(st.readingMm, R),
          fromMmTo(r?.leastSquares.residuals[i], R),
          fromMmTo(r?.leastSquares.straightness, R),
          fromMmTo(r?.minimumZone.straightness, R),
          s.target.value,
          unitName(s.target.unit),
          words(s.status),
        ]),
      );
    }
    return { filename: fileName('rail', rail.label, 'sweeps'), content: csvFile(header, rows) };
  }

  /** Every move of every travel trial of an axis, newest trial first. */
  async travelTrials(actor: SessionUser, axisId: string): Promise<CsvDownload> {
    const axis = await this.axes.get(actor, axisId);
    const list = await this.all((cursor) => this.trials.list(actor, axisId, { limit: PAGE, cursor }));
    const full = [];
    for (const t of list) full.push(await this.trials.get(actor, axisId, t.id));
    const L: LengthUnit = full[0]?.lengthUnit ?? 'mm';
    const header = [
      'Trial',
      'Recorded at',
      'Recorded by',
      'Move',
      `Commanded (${UNIT_NAMES[L]})`,
      `Measured (${UNIT_NAMES[L]})`,
      `Measured − commanded (${UNIT_NAMES[L]})`,
      'Steps per mm used',
      'Scale error (%)',
      'Corrected steps per mm',
      'Status',
    ];
    const rows: Cell[][] = [];
    for (const t of full) {
      t.moves.forEach((m, i) => {
        const commanded = convert(m.commanded, t.lengthUnit, L);
        const measured = convert(m.measured, t.lengthUnit, L);
        rows.push([
          t.id,
          isoTime(t.recordedAt),
          t.recordedBy,
          i + 1,
          commanded,
          measured,
          convert(m.measured - m.commanded, t.lengthUnit, L),
          t.stepsPerMmUsed,
          t.result ? tidy(t.result.errorPercent) : null,
          t.result ? tidy(t.result.correctedStepsPerMm) : null,
          words(t.status),
        ]);
      });
    }
    return { filename: fileName('axis', axis.name, 'travel-trials'), content: csvFile(header, rows) };
  }

  /** Every deviation of every repeat-and-reverse run of an axis: one row per target, run and direction. */
  async positioningRuns(actor: SessionUser, axisId: string): Promise<CsvDownload> {
    const axis = await this.axes.get(actor, axisId);
    const list = await this.all((cursor) => this.runs.list(actor, axisId, { limit: PAGE, cursor }));
    const full = [];
    for (const r of list) full.push(await this.runs.get(actor, axisId, r.id));
    const L: LengthUnit = full[0]?.lengthUnit ?? 'mm';
    const R: LengthUnit = full[0]?.readingUnit ?? 'mm';
    const header = [
      'Run',
      'Recorded at',
      'Recorded by',
      'Pass',
      'Direction',
      'Target',
      `Target position (${UNIT_NAMES[L]})`,
      `Deviation (${UNIT_NAMES[R]})`,
      'Status',
    ];
    const rows: Cell[][] = [];
    for (const run of full) {
      run.runs.forEach((pass, p) =>
        pass.deviations.forEach((d, i) =>
          rows.push([
            run.id,
            isoTime(run.recordedAt),
            run.recordedBy,
            p + 1,
            pass.direction,
            i + 1,
            convert(run.targets[i], run.lengthUnit, L),
            convert(d, run.readingUnit, R),
            words(run.status),
          ]),
        ),
      );
    }
    return { filename: fileName('axis', axis.name, 'repeat-and-reverse-runs'), content: csvFile(header, rows) };
  }

  /** Every height of every bed grid of a machine, newest grid first. */
  async bedGrids(actor: SessionUser, machineId: string): Promise<CsvDownload> {
    const machine = await this.machines.getRef(actor, machineId);
    const grids = [...(await this.grids.list(actor, machineId))].sort((a, b) =>
      b.recordedAt.localeCompare(a.recordedAt),
    );
    const L: LengthUnit = grids[0]?.lengthUnit ?? 'mm';
    const R: LengthUnit = grids[0]?.readingUnit ?? 'mm';
    const header = [
      'Bed grid',
      'Recorded at',
      'Recorded by',
      'Point',
      `X (${UNIT_NAMES[L]})`,
      `Y (${UNIT_NAMES[L]})`,
      `Height (${UNIT_NAMES[R]})`,
      `Flatness judged (${UNIT_NAMES[R]})`,
      'Judged on',
      'Status',
    ];
    const rows: Cell[][] = [];
    for (const g of grids) {
      g.points.forEach((p, i) =>
        rows.push([
          g.id,
          isoTime(g.recordedAt),
          g.recordedBy.name,
          i + 1,
          convert(p.x, g.lengthUnit, L),
          convert(p.y, g.lengthUnit, L),
          convert(p.z, g.readingUnit, R),
          fromMmTo(g.result?.judged.valueMm, R),
          g.result?.judged.label ?? null,
          words(g.status),
        ]),
      );
    }
    return { filename: fileName(machine.name, 'bed-grids'), content: csvFile(header, rows) };
  }

  /** Every page of a list, following its cursor. */
  private async all<T>(
    page: (cursor: string | undefined) => Promise<{ items: T[]; nextCursor: string | null }>,
  ): Promise<T[]> {
    const out: T[] = [];
    let cursor: string | undefined;
    do {
      const p = await page(cursor);
      out.push(...p.items);
      cursor = p.nextCursor ?? undefined;
    } while (cursor);
    return out;
  }
}

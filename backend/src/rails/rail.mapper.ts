import { holePositions } from '../engine/bolt-down.js';
import type { StoredSweepResult } from '../database/schema/rails.js';
import { typicalBoltFor } from './bolt-torques.js';
import type { LatestSweep, RailRow, SweepListRow, SweepRow } from './rails.repository.js';
import { finiteList, finiteOrNull, readableResult, UNREADABLE_INPUT, UNREADABLE_RESULT } from '../common/stored-result.js';

/** The numbers the readers of a stored sweep result use (the residual lists are checked element by element below). */
export const SWEEP_SHAPE = ['leastSquares.slope', 'leastSquares.intercept', 'leastSquares.straightness', 'leastSquares.residuals[]', 'minimumZone.slope', 'minimumZone.intercept', 'minimumZone.straightness', 'minimumZone.residuals[]', 'endPoint.slope', 'endPoint.intercept', 'endPoint.straightness', 'endPoint.residuals[]'];
export function storedSweepResult(stored: unknown): StoredSweepResult | null {
  const r = readableResult<StoredSweepResult>(stored, SWEEP_SHAPE);
  return r && finiteList(r.leastSquares.residuals) && finiteList(r.minimumZone.residuals) && finiteList(r.endPoint.residuals) ? r : null;
}

export const UNREADABLE_RAIL =
  'The stored length, hole pitch or first hole of this rail cannot be read (a number is missing or not finite); correct it on the rail form.';

export interface RailResponse {
  id: string;
  machineId: string;
  label: string;
  axis: string;
  /** Goes out as null when the stored length cannot be read (see `unreadable`). */
  lengthMm: number;
  profileSize: number | null;
  holePitchMm: number;
  firstHoleMm: number;
  partnerRailId: string | null;
  /** Hole centres from the rail's start, mm. */
  holes: { index: number; position: number }[];
  typicalBoltSize: string | null;
  createdAt: string;
  updatedAt: string;
  /** Present when the stored geometry cannot be read: holes is then empty. */
  unreadable?: string;
}

export interface SweepSummary {
  id: string;
  takenAt: string;
  phase: string;
  datum: string | null;
  /** null when the stored result cannot be read (see `unreadable`). */
  leastSquaresStraightness: number | null;
  minimumZoneStraightness: number | null;
  status: SweepRow['status'];
  target: { value: number; unit: string };
  unreadable?: string;
}

/** A sweep in its rail's list: the summary and what the history table shows, no readings (GET /api/sweeps/:id has them). */
export interface SweepListItem extends SweepSummary {
  railId: string;
  machineId: string;
  unit: SweepRow['unit'];
  takenBy: string;
  stationCount: number;
  createdAt: string;
  locked: boolean;
}

export interface RailListItem extends RailResponse {
  sweepCount: number;
  latestSweep: SweepSummary | null;
}

export interface SweepResponse {
  id: string;
  railId: string;
  machineId: string;
  unit: SweepRow['unit'];
  /** position in mm; reading as entered (in `unit`); readingMm converted. */
  stations: { position: number; reading: number; readingMm: number }[] | null;
  instrument: string;
  resolution: number | null;
  temperatureC: number | null;
  phase: SweepRow['phase'];
  takenBy: string;
  boltSize: string | null;
  torqueNm: number | null;
  datum: string | null;
  notes: string;
  result: StoredSweepResult | null;
  status: SweepRow['status'];
  target: { value: number; unit: string };
  /** Present when the stored result or readings cannot be read: those come back null. */
  unreadable?: string;
  takenAt: string;
  createdAt: string;
  /** An approval was based on it: it can no longer be deleted. */
  locked: boolean;
}

export function railHoles(row: Pick<RailRow, 'lengthMm' | 'holePitchMm' | 'firstHoleMm'>) {
  return holePositions({ lengthMm: row.lengthMm, pitchMm: row.holePitchMm, firstHoleOffsetMm: row.firstHoleMm }).map((position, index) => ({ index, position }));
}

/** The rail's holes, or null when its stored geometry cannot be read (an old bad row). */
function readableHoles(row: RailRow) {
  if (![row.lengthMm, row.holePitchMm, row.firstHoleMm].every((v) => Number.isFinite(v))) return null;
  try {
    return railHoles(row);
  } catch {
    return null;
  }
}

export function toRailResponse(row: RailRow): RailResponse {
  const holes = readableHoles(row);
  return {
    id: row.id,
    machineId: row.machineId,
    label: row.label,
    axis: row.axis,
    lengthMm: row.lengthMm,
    profileSize: row.profileSizeMm,
    holePitchMm: row.holePitchMm,
    firstHoleMm: row.firstHoleMm,
    partnerRailId: row.partnerRailId,
    holes: holes ?? [],
    ...(holes ? {} : { unreadable: UNREADABLE_RAIL }),
    typicalBoltSize: typicalBoltFor(row.profileSizeMm),
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

export function toSweepSummary(row: SweepRow): SweepSummary {
  const r = storedSweepResult(row.result);
  return {
    id: row.id,
    takenAt: row.takenAt.toISOString(),
    phase: row.phase,
    datum: row.datum,
    leastSquaresStraightness: r ? r.leastSquares.straightness : null,
    minimumZoneStraightness: r ? r.minimumZone.straightness : null,
    status: r ? row.status : 'outside-target',
    target: row.target,
    ...(r ? {} : { unreadable: UNREADABLE_RESULT }),
  };
}

/** The straightness columns read out of a stored result in SQL: both must be finite numbers. */
export const summaryReadable = (s: Pick<LatestSweep, 'leastSquaresStraightness' | 'minimumZoneStraightness'>) =>
  finiteOrNull(s.leastSquaresStraightness) !== null && finiteOrNull(s.minimumZoneStraightness) !== null;

/** The same summary from the newest-sweep query, which reads no readings. */
export function toLatestSweepSummary(s: LatestSweep): SweepSummary {
  return {
    id: s.id,
    takenAt: s.takenAt.toISOString(),
    phase: s.phase,
    datum: s.datum,
    ...readableFigures(s),
    target: s.target,
  };
}

function readableFigures(s: Pick<LatestSweep, 'leastSquaresStraightness' | 'minimumZoneStraightness' | 'status'>) {
  return summaryReadable(s)
    ? { leastSquaresStraightness: s.leastSquaresStraightness, minimumZoneStraightness: s.minimumZoneStraightness, status: s.status }
    : { leastSquaresStraightness: null, minimumZoneStraightness: null, status: 'outside-target' as const, unreadable: UNREADABLE_RESULT };
}

export function toSweepResponse(row: SweepRow, locked: boolean): SweepResponse {
  const result = storedSweepResult(row.result);
  const readings = finiteList(row.positionsMm) && finiteList(row.readingsMm) && finiteList(row.readingsRaw) && row.readingsMm.length === row.positionsMm.length && row.readingsRaw.length === row.positionsMm.length;
  return {
    id: row.id,
    railId: row.railId,
    machineId: row.machineId,
    unit: row.unit,
    stations: readings ? row.positionsMm.map((position, i) => ({ position, reading: row.readingsRaw[i], readingMm: row.readingsMm[i] })) : null,
    instrument: row.instrument,
    resolution: row.resolution,
    temperatureC: row.temperatureC,
    phase: row.phase,
    takenBy: row.takenBy,
    boltSize: row.boltSize,
    torqueNm: row.torqueNm,
    datum: row.datum,
    notes: row.notes,
    result,
    status: result && readings ? row.status : 'outside-target',
    target: row.target,
    ...(result && readings ? {} : { unreadable: result ? UNREADABLE_INPUT : UNREADABLE_RESULT }),
    takenAt: row.takenAt.toISOString(),
    createdAt: row.createdAt.toISOString(),
    locked,
  };
}

export function toSweepListItem(row: SweepListRow, locked: boolean): SweepListItem {
  return {
    id: row.id,
    railId: row.railId,
    machineId: row.machineId,
    unit: row.unit,
    takenAt: row.takenAt.toISOString(),
    takenBy: row.takenBy,
    phase: row.phase,
    datum: row.datum,
    ...readableFigures(row),
    target: row.target,
    stationCount: row.stationCount,
    createdAt: row.createdAt.toISOString(),
    locked,
  };
}

import { holePositions } from '../engine/bolt-down.js';
import type { StoredSweepResult } from '../database/schema/rails.js';
import { typicalBoltFor } from './bolt-torques.js';
import type { LatestSweep, RailRow, SweepListRow, SweepRow } from './rails.repository.js';

export interface RailResponse {
  id: string;
  machineId: string;
  label: string;
  axis: string;
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
}

export interface SweepSummary {
  id: string;
  takenAt: string;
  phase: string;
  datum: string | null;
  leastSquaresStraightness: number;
  minimumZoneStraightness: number;
  status: SweepRow['status'];
  target: { value: number; unit: string };
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
  stations: { position: number; reading: number; readingMm: number }[];
  instrument: string;
  resolution: number | null;
  temperatureC: number | null;
  phase: SweepRow['phase'];
  takenBy: string;
  boltSize: string | null;
  torqueNm: number | null;
  datum: string | null;
  notes: string;
  result: StoredSweepResult;
  status: SweepRow['status'];
  target: { value: number; unit: string };
  takenAt: string;
  createdAt: string;
  /** An approval was based on it: it can no longer be deleted. */
  locked: boolean;
}

export function railHoles(row: Pick<RailRow, 'lengthMm' | 'holePitchMm' | 'firstHoleMm'>) {
  return holePositions({ lengthMm: row.lengthMm, pitchMm: row.holePitchMm, firstHoleOffsetMm: row.firstHoleMm }).map((position, index) => ({ index, position }));
}

export function toRailResponse(row: RailRow): RailResponse {
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
    holes: railHoles(row),
    typicalBoltSize: typicalBoltFor(row.profileSizeMm),
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

export function toSweepSummary(row: SweepRow): SweepSummary {
  return {
    id: row.id,
    takenAt: row.takenAt.toISOString(),
    phase: row.phase,
    datum: row.datum,
    leastSquaresStraightness: row.result.leastSquares.straightness,
    minimumZoneStraightness: row.result.minimumZone.straightness,
    status: row.status,
    target: row.target,
  };
}

/** The same summary from the newest-sweep query, which reads no readings. */
export function toLatestSweepSummary(s: LatestSweep): SweepSummary {
  return {
    id: s.id,
    takenAt: s.takenAt.toISOString(),
    phase: s.phase,
    datum: s.datum,
    leastSquaresStraightness: s.leastSquaresStraightness,
    minimumZoneStraightness: s.minimumZoneStraightness,
    status: s.status,
    target: s.target,
  };
}

export function toSweepResponse(row: SweepRow, locked: boolean): SweepResponse {
  return {
    id: row.id,
    railId: row.railId,
    machineId: row.machineId,
    unit: row.unit,
    stations: row.positionsMm.map((position, i) => ({ position, reading: row.readingsRaw[i], readingMm: row.readingsMm[i] })),
    instrument: row.instrument,
    resolution: row.resolution,
    temperatureC: row.temperatureC,
    phase: row.phase,
    takenBy: row.takenBy,
    boltSize: row.boltSize,
    torqueNm: row.torqueNm,
    datum: row.datum,
    notes: row.notes,
    result: row.result,
    status: row.status,
    target: row.target,
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
    leastSquaresStraightness: row.leastSquaresStraightness,
    minimumZoneStraightness: row.minimumZoneStraightness,
    status: row.status,
    target: row.target,
    stationCount: row.stationCount,
    createdAt: row.createdAt.toISOString(),
    locked,
  };
}

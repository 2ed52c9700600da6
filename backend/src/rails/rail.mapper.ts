import { holePositions } from '../engine/bolt-down.js';
import type { StoredLocalSlope, StoredSweepResult } from '../database/schema/rails.js';
import type { ResultWarning } from '../engine/warnings.js';
import { slopeOf } from './sweep-judgement.js';
import { typicalBoltFor } from './bolt-torques.js';
import { defaultEndDistanceMm } from '../engine/rail-holes.js';
import { fromMm, type LengthUnit } from '../engine/units.js';
import type { LatestSweep, RailRow, SweepListRow, SweepRow } from './rails.repository.js';
import {
  finiteList,
  finiteOrNull,
  readableResult,
  UNREADABLE_INPUT,
  UNREADABLE_RESULT,
} from '../common/stored-result.js';

/** The numbers the readers of a stored sweep result use (the residual lists are checked element by element below). */
export const SWEEP_SHAPE = [
  'leastSquares.slope',
  'leastSquares.intercept',
  'leastSquares.straightness',
  'leastSquares.residuals[]',
  'minimumZone.slope',
  'minimumZone.intercept',
  'minimumZone.straightness',
  'minimumZone.residuals[]',
  'endPoint.slope',
  'endPoint.intercept',
  'endPoint.straightness',
  'endPoint.residuals[]',
];
export function storedSweepResult(stored: unknown): StoredSweepResult | null {
  const r = readableResult<StoredSweepResult>(stored, SWEEP_SHAPE);
  return r &&
    finiteList(r.leastSquares.residuals) &&
    finiteList(r.minimumZone.residuals) &&
    finiteList(r.endPoint.residuals)
    ? r
    : null;
}

export const UNREADABLE_RAIL =
  'The stored length, hole pitch or first hole of this rail cannot be read (a number is missing or not finite); correct it on the rail form.';

export interface RailResponse {
  id: string;
  machineId: string;
  label: string;
  axis: string;
  /** Unit the lengths below were typed in; `length`, `holePitch`, … are in it, the `…Mm` twins in mm. */
  lengthUnit: RailRow['lengthUnit'];
  /** Rail length, in lengthUnit. */
  length: number;
  /** Distance between neighbouring mounting holes, in lengthUnit. */
  holePitch: number;
  /** First hole's centre from the rail's start, in lengthUnit. */
  firstHole: number;
  /** Distance to the partner rail (a in S = a × K), in lengthUnit; null until entered. */
  spacing: number | null;
  /** The end distance the holes keep, in lengthUnit; `endDistanceIsDefault` when not entered. */
  endDistance: number;
  endDistanceIsDefault: boolean;
  /** Rail length in mm; goes out as null when the stored length cannot be read (see `unreadable`). */
  lengthMm: number;
  /** Profile (rail) size, in mm (15, 20, 25 …); null when not entered. */
  profileSize: number | null;
  holePitchMm: number;
  firstHoleMm: number;
  spacingMm: number | null;
  endDistanceMm: number;
  partnerRailId: string | null;
  /** Hole centres from the rail's start, in mm (`position`) and in lengthUnit (`at`). */
  holes: {
    /** The hole from the rail's start, index from 0. */
    index: number;
    /** Hole centre from the rail's start, mm. */
    position: number;
    /** Hole centre from the rail's start, in `lengthUnit`. */
    at: number;
  }[];
  typicalBoltSize: string | null;
  createdAt: string;
  updatedAt: string;
  /** Present when the stored geometry cannot be read: holes is then empty. */
  unreadable?: string;
}

export interface SweepSummary {
  id: string;
  takenAt: string;
  phase: SweepRow['phase'];
  datum: string | null;
  /** Straightness about the least-squares line, in mm; null when the stored result cannot be read (see `unreadable`). */
  leastSquaresStraightness: number | null;
  /** Straightness by the minimum zone (the narrowest band holding every reading), in mm; null when unreadable. */
  minimumZoneStraightness: number | null;
  status: SweepRow['status'];
  target: SweepRow['target'];
  face: SweepRow['face'];
  readingUnit: SweepRow['readingUnit'];
  lengthUnit: SweepRow['lengthUnit'];
  /** Largest local slope of the judged residuals, mm/m (null on sweeps saved before it was kept). */
  localSlopeMmPerM: number | null;
  unreadable?: string;
}

/** A sweep in its rail's list: the summary and what the history table shows, no readings (GET /api/sweeps/:id has them). */
export interface SweepListItem extends SweepSummary {
  railId: string;
  machineId: string;
  takenBy: string;
  /** Count of stations read. */
  stationCount: number;
  createdAt: string;
  locked: boolean;
}

export interface RailListItem extends RailResponse {
  /** Count of sweeps the rail has. */
  sweepCount: number;
  latestSweep: SweepSummary | null;
}

export interface SweepResponse {
  id: string;
  railId: string;
  machineId: string;
  /** Positions are in lengthUnit, readings and resolution in readingUnit, as typed; the `…Mm` twins in mm. */
  lengthUnit: SweepRow['lengthUnit'];
  readingUnit: SweepRow['readingUnit'];
  face: SweepRow['face'];
  /** Each station: `position` in lengthUnit and in mm, `reading` in readingUnit as typed and in mm. */
  stations:
    | {
        /** Station position, in `lengthUnit`. */
        position: number;
        positionMm: number;
        /** Indicator reading, in `readingUnit`. */
        reading: number;
        readingMm: number;
      }[]
    | null;
  localSlope: StoredLocalSlope | null;
  warnings: ResultWarning[];
  instrument: string;
  /** Smallest step the indicator reads, in readingUnit. */
  resolution: number | null;
  /** Air temperature while the sweep was taken, °C. */
  temperatureC: number | null;
  phase: SweepRow['phase'];
  takenBy: string;
  boltSize: string | null;
  /** Bolt tightening torque, N·m. */
  torqueNm: number | null;
  datum: string | null;
  notes: string;
  result: StoredSweepResult | null;
  status: SweepRow['status'];
  target: SweepRow['target'];
  /** Present when the stored result or readings cannot be read: those come back null. */
  unreadable?: string;
  takenAt: string;
  createdAt: string;
  /** An approval was based on it: it can no longer be deleted. */
  locked: boolean;
}

export function railHoles(row: Pick<RailRow, 'lengthMm' | 'holePitchMm' | 'firstHoleMm'>) {
  return holePositions({ lengthMm: row.lengthMm, pitchMm: row.holePitchMm, firstHoleOffsetMm: row.firstHoleMm }).map(
    (position, index) => ({ index, position }),
  );
}

/** A length in mm back in the unit it was typed in, without binary noise (31.5 in stays 31.5). */
export const inLengthUnit = (mm: number, unit: LengthUnit) =>
  unit === 'mm' ? mm : Number(fromMm(mm, unit).toPrecision(15));

export function railEndDistanceMm(row: Pick<RailRow, 'endDistanceMm' | 'profileSizeMm'>): number {
  return row.endDistanceMm ?? defaultEndDistanceMm(typicalBoltFor(row.profileSizeMm));
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
    lengthUnit: row.lengthUnit,
    length: inLengthUnit(row.lengthMm, row.lengthUnit),
    holePitch: inLengthUnit(row.holePitchMm, row.lengthUnit),
    firstHole: inLengthUnit(row.firstHoleMm, row.lengthUnit),
    spacing: row.spacingMm === null ? null : inLengthUnit(row.spacingMm, row.lengthUnit),
    endDistance: inLengthUnit(railEndDistanceMm(row), row.lengthUnit),
    endDistanceIsDefault: row.endDistanceMm === null,
    lengthMm: row.lengthMm,
    profileSize: row.profileSizeMm,
    holePitchMm: row.holePitchMm,
    firstHoleMm: row.firstHoleMm,
    spacingMm: row.spacingMm,
    endDistanceMm: railEndDistanceMm(row),
    partnerRailId: row.partnerRailId,
    holes: (holes ?? []).map((h) => ({ ...h, at: inLengthUnit(h.position, row.lengthUnit) })),
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
    face: row.face,
    readingUnit: row.readingUnit,
    lengthUnit: row.lengthUnit,
    localSlopeMmPerM: r?.localSlope?.mmPerM ?? null,
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
    face: s.face,
    readingUnit: s.readingUnit,
    lengthUnit: s.lengthUnit,
    localSlopeMmPerM: s.localSlopeMmPerM,
  };
}

function readableFigures(s: Pick<LatestSweep, 'leastSquaresStraightness' | 'minimumZoneStraightness' | 'status'>) {
  return summaryReadable(s)
    ? {
        leastSquaresStraightness: s.leastSquaresStraightness,
        minimumZoneStraightness: s.minimumZoneStraightness,
        status: s.status,
      }
    : {
        leastSquaresStraightness: null,
        minimumZoneStraightness: null,
        status: 'outside-target' as const,
        unreadable: UNREADABLE_RESULT,
      };
}

export function toSweepResponse(row: SweepRow, locked: boolean): SweepResponse {
  const result = storedSweepResult(row.result);
  const readings =
    finiteList(row.positionsMm) &&
    finiteList(row.readingsMm) &&
    finiteList(row.readingsRaw) &&
    row.readingsMm.length === row.positionsMm.length &&
    row.readingsRaw.length === row.positionsMm.length;
  return {
    id: row.id,
    railId: row.railId,
    machineId: row.machineId,
    lengthUnit: row.lengthUnit,
    readingUnit: row.readingUnit,
    face: row.face,
    stations: readings
      ? row.positionsMm.map((positionMm, i) => ({
          position: inLengthUnit(positionMm, row.lengthUnit),
          positionMm,
          reading: row.readingsRaw[i],
          readingMm: row.readingsMm[i],
        }))
      : null,
    localSlope:
      result && readings
        ? (result.localSlope ?? slopeOf(row.positionsMm, result, row.target.reference ?? 'least-squares'))
        : null,
    warnings: Array.isArray(row.warnings) ? row.warnings : [],
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
    takenAt: row.takenAt.toISOString(),
    takenBy: row.takenBy,
    phase: row.phase,
    datum: row.datum,
    ...readableFigures(row),
    target: row.target,
    face: row.face,
    readingUnit: row.readingUnit,
    lengthUnit: row.lengthUnit,
    localSlopeMmPerM: row.localSlopeMmPerM,
    stationCount: row.stationCount,
    createdAt: row.createdAt.toISOString(),
    locked,
  };
}

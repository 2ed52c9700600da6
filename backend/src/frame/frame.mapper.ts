import type { TargetValue } from '../database/schema/target-sets.js';
import { fromMm, type LengthUnit } from '../engine/units.js';
import type { CheckStatus } from '../records/readiness.js';
import type { BedGridResult } from './bed-grid-result.js';
import type { DiagonalCheckResult } from './diagonal-check-result.js';
import type { BedGridRow, DiagonalCheckRow, TestCutRow } from './frame.repository.js';
import type { TestCutResult } from './test-cut-result.js';
import { finiteOrNull, UNREADABLE_INPUT } from '../common/stored-result.js';
import type { ResultWarning } from '../engine/warnings.js';

export type FrameStatus = Exclude<CheckStatus, 'waived' | 'not-started'>;

export interface JudgedTarget extends TargetValue {
  label: string;
}

/** What every frame record answers with, before the fields of its own kind. */
interface FrameRecordCommon {
  id: string;
  machineId: string;
  /** Unit the record's lengths were entered in and are given back in. */
  lengthUnit: LengthUnit;
  note: string;
  recordedBy: { id: string | null; name: string };
  recordedAt: string;
  status: FrameStatus;
  target: JudgedTarget;
  locked: boolean;
  /** What a person should know about the result (empty when none). */
  warnings: ResultWarning[];
}

/** The lengths of a diagonal check (null where a stored number cannot be read). */
export interface DiagonalLengths {
  sideX: number | null;
  sideY: number | null;
  diagonal1: number | null;
  diagonal2: number | null;
  gantrySpan: number | null;
}

export interface DiagonalCheckResponse extends FrameRecordCommon {
  /** Smallest step of the tape or rule, in lengthUnit (null: not recorded). */
  resolution: number | null;
  /** As entered, in lengthUnit. */
  input: DiagonalLengths;
  /** The same in mm. */
  inputMm: DiagonalLengths;
  result: DiagonalCheckResult | null;
  /** Present when the record's stored measurements cannot be read (result is then null). */
  unreadable?: string;
}

/** One point of a bed grid as entered: position in lengthUnit, height in readingUnit. */
export interface BedGridPointEntered {
  x: number | null;
  y: number | null;
  z: number | null;
}

export interface BedGridResponse extends FrameRecordCommon {
  /** Unit the heights (and the gauge's resolution) were read in and are given back in. */
  readingUnit: LengthUnit;
  /** Smallest step of the gauge, in readingUnit (null: not recorded). */
  resolution: number | null;
  rows: number | null;
  columns: number | null;
  points: BedGridPointEntered[];
  /** In mm. */
  result: BedGridResult | null;
  /** Present when the record's stored measurements cannot be read (result is then null). */
  unreadable?: string;
}

/** The two targets a test cut is judged against: part size and squareness. */
export interface TestCutTargets {
  part: JudgedTarget;
  squareness: JudgedTarget;
}

/** The sizes the test cut was commanded at, in lengthUnit. */
export interface TestCutNominal {
  x: number | null;
  y: number | null;
  circle: number | null;
}

/** The sizes measured on the cut part, in lengthUnit. */
export interface TestCutMeasured {
  x: number | null;
  y: number | null;
  diagonal1: number | null;
  diagonal2: number | null;
  circleX: number | null;
  circleY: number | null;
  kerf: number | null;
}

export interface TestCutResponse extends FrameRecordCommon {
  targets: TestCutTargets;
  /** Plate thickness in lengthUnit (null: not recorded). */
  plateThickness: number | null;
  plateThicknessMm: number | null;
  /** Smallest step of the caliper or rule, in lengthUnit (null: not recorded). */
  resolution: number | null;
  nominal: TestCutNominal;
  measured: TestCutMeasured;
  circleKind: TestCutRow['sizes']['circleKind'] | null;
  /** The controller's steps per mm for X and Y when the part was cut (null where not recorded). */
  stepsPerMm: TestCutRow['sizes']['stepsPerMm'] | null;
  result: TestCutResult | null;
  /** Present when the record's stored measurements cannot be read (result is then null). */
  unreadable?: string;
}

function common(
  row: DiagonalCheckRow | BedGridRow | TestCutRow,
  status: FrameStatus,
  target: JudgedTarget,
  locked: boolean,
  warnings: ResultWarning[],
): FrameRecordCommon {
  return {
    id: row.id,
    machineId: row.machineId,
    lengthUnit: row.lengthUnit,
    note: row.note,
    recordedBy: { id: row.recordedById, name: row.recordedByName },
    recordedAt: row.recordedAt.toISOString(),
    status,
    target,
    locked,
    warnings,
  };
}

// Back in the entered unit; 12 significant digits drop the binary noise of the round trip through mm.
// A stored number that cannot be read (an old bad row) goes out as null, never as a thrown error.
const inUnit = (mm: unknown, unit: LengthUnit): number | null => {
  const v = finiteOrNull(mm as number);
  return v === null ? null : Number(fromMm(v, unit).toPrecision(12));
};
const field = (o: unknown, key: string): unknown =>
  o !== null && typeof o === 'object' ? (o as Record<string, unknown>)[key] : undefined;
/** A record whose stored measurements cannot be read carries no result and says so. */
const unreadable = (result: unknown) => (result === null ? { unreadable: UNREADABLE_INPUT } : {});

export function toDiagonalCheckResponse(
  row: DiagonalCheckRow,
  result: DiagonalCheckResult | null,
  status: FrameStatus,
  target: JudgedTarget,
  locked: boolean,
  warnings: ResultWarning[],
): DiagonalCheckResponse {
  const u = row.lengthUnit;
  return {
    ...common(row, status, target, locked, warnings),
    resolution: row.resolutionMm == null ? null : inUnit(row.resolutionMm, u),
    // As entered (in `lengthUnit`) and in mm.
    input: {
      sideX: inUnit(row.sideXMm, u),
      sideY: inUnit(row.sideYMm, u),
      diagonal1: inUnit(row.diagonal1Mm, u),
      diagonal2: inUnit(row.diagonal2Mm, u),
      gantrySpan: row.gantrySpanMm == null ? null : inUnit(row.gantrySpanMm, u),
    },
    inputMm: {
      sideX: finiteOrNull(row.sideXMm),
      sideY: finiteOrNull(row.sideYMm),
      diagonal1: finiteOrNull(row.diagonal1Mm),
      diagonal2: finiteOrNull(row.diagonal2Mm),
      gantrySpan: finiteOrNull(row.gantrySpanMm),
    },
    result,
    ...unreadable(result),
  };
}

export function toBedGridResponse(
  row: BedGridRow,
  result: BedGridResult | null,
  status: FrameStatus,
  target: JudgedTarget,
  locked: boolean,
  warnings: ResultWarning[],
): BedGridResponse {
  return {
    ...common(row, status, target, locked, warnings),
    readingUnit: row.readingUnit,
    resolution: row.resolutionMm == null ? null : inUnit(row.resolutionMm, row.readingUnit),
    rows: row.rows ?? result?.rows ?? null,
    columns: row.columns ?? result?.columns ?? null,
    // Positions as entered (in `lengthUnit`), heights as entered (in `readingUnit`); the result is in mm.
    points: (Array.isArray(row.points) ? row.points : []).map((p) => ({
      x: inUnit(field(p, 'xMm'), row.lengthUnit),
      y: inUnit(field(p, 'yMm'), row.lengthUnit),
      z: inUnit(field(p, 'zMm'), row.readingUnit),
    })),
    result,
    ...unreadable(result),
  };
}

export function toTestCutResponse(
  row: TestCutRow,
  result: TestCutResult | null,
  status: FrameStatus,
  target: TestCutTargets,
  locked: boolean,
  warnings: ResultWarning[],
): TestCutResponse {
  const u = row.lengthUnit;
  const s = row.sizes;
  const nominal = field(s, 'nominal');
  const measured = field(s, 'measured');
  return {
    ...common(row, status, target.part, locked, warnings),
    targets: target,
    plateThickness: row.plateThicknessMm == null ? null : inUnit(row.plateThicknessMm, u),
    plateThicknessMm: finiteOrNull(row.plateThicknessMm),
    resolution: row.resolutionMm == null ? null : inUnit(row.resolutionMm, u),
    nominal: {
      x: inUnit(field(nominal, 'xMm'), u),
      y: inUnit(field(nominal, 'yMm'), u),
      circle: inUnit(field(nominal, 'circleMm'), u),
    },
    measured: {
      x: inUnit(field(measured, 'xMm'), u),
      y: inUnit(field(measured, 'yMm'), u),
      diagonal1: inUnit(field(measured, 'diagonal1Mm'), u),
      diagonal2: inUnit(field(measured, 'diagonal2Mm'), u),
      circleX: inUnit(field(measured, 'circleXMm'), u),
      circleY: inUnit(field(measured, 'circleYMm'), u),
      kerf: inUnit(field(s, 'kerfMm'), u),
    },
    circleKind: (field(s, 'circleKind') ?? null) as TestCutRow['sizes']['circleKind'] | null,
    stepsPerMm: (field(s, 'stepsPerMm') ?? null) as TestCutRow['sizes']['stepsPerMm'] | null,
    result,
    ...unreadable(result),
  };
}

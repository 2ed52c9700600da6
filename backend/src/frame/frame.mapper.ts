import type { TargetValue } from '../database/schema/target-sets.js';
import { fromMm, type LengthUnit } from '../engine/units.js';
import type { CheckStatus } from '../records/readiness.js';
import type { BedGridResult } from './bed-grid-result.js';
import type { DiagonalCheckResult } from './diagonal-check-result.js';

import type { DiagonalCheckRow } from './diagonal-checks.service.js';
import type { BedGridRow } from './bed-grids.service.js';
import type { TestCutRow } from './test-cuts.service.js';
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
/** A diagonal check's lengths as entered. */
export interface DiagonalLengths {
  /** Side along X, in the record's `lengthUnit`. */
  sideX: number | null;
  /** Side along Y, in the record's `lengthUnit`. */
  sideY: number | null;
  /** Diagonal from the X0 Y0 corner, in the record's `lengthUnit`. */
  diagonal1: number | null;
  /** The other diagonal, in the record's `lengthUnit`. */
  diagonal2: number | null;
  /** Distance between the gantry's two bearing rails, in the record's `lengthUnit`. */
  gantrySpan: number | null;
}

/** The same lengths in mm. */
export interface DiagonalLengthsMm {
  /** Side along X, mm. */
  sideX: number | null;
  /** Side along Y, mm. */
  sideY: number | null;
  /** Diagonal from the X0 Y0 corner, mm. */
  diagonal1: number | null;
  /** The other diagonal, mm. */
  diagonal2: number | null;
  /** Distance between the gantry's two bearing rails, mm. */
  gantrySpan: number | null;
}

export interface DiagonalCheckResponse extends FrameRecordCommon {
  /** Smallest step of the tape or rule, in lengthUnit (null: not recorded). */
  resolution: number | null;
  /** As entered, in lengthUnit. */
  input: DiagonalLengths;
  /** The same in mm. */
  inputMm: DiagonalLengthsMm;
  result: DiagonalCheckResult | null;
  /** Present when the record's stored measurements cannot be read (result is then null). */
  unreadable?: string;
}

/** One point of a bed grid as entered: position in lengthUnit, height in readingUnit. */
export interface BedGridPointEntered {
  /** Position along X, in the record's `lengthUnit`. */
  x: number | null;
  /** Position along Y, in the record's `lengthUnit`. */
  y: number | null;
  /** Height read, in the record's `readingUnit`. */
  z: number | null;
}

export interface BedGridResponse extends FrameRecordCommon {
  /** Unit the heights (and the gauge's resolution) were read in and are given back in. */
  readingUnit: LengthUnit;
  /** Smallest step of the gauge, in readingUnit (null: not recorded). */
  resolution: number | null;
  /** Count of rows of the grid (along Y). */
  rows: number | null;
  /** Count of columns of the grid (along X). */
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
  /** Commanded size of the square along X, in the record's `lengthUnit`. */
  x: number | null;
  /** Commanded size of the square along Y, in the record's `lengthUnit`. */
  y: number | null;
  /** Commanded diameter of the circle, in the record's `lengthUnit`. */
  circle: number | null;
}

/** The sizes measured on the cut part, in lengthUnit. */
export interface TestCutMeasured {
  /** Measured size of the square along X, in the record's `lengthUnit`. */
  x: number | null;
  /** Measured size of the square along Y, in the record's `lengthUnit`. */
  y: number | null;
  /** Measured diagonal from the X0 Y0 corner, in the record's `lengthUnit`. */
  diagonal1: number | null;
  /** Measured other diagonal, in the record's `lengthUnit`. */
  diagonal2: number | null;
  /** Measured diameter of the circle along X, in the record's `lengthUnit`. */
  circleX: number | null;
  /** Measured diameter of the circle along Y, in the record's `lengthUnit`. */
  circleY: number | null;
  /** Width of cut the controller did not compensate for, in the record's `lengthUnit`. */
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
    /** Smallest step of the tape or rule, in the record's `lengthUnit`. */
    resolution: row.resolutionMm == null ? null : inUnit(row.resolutionMm, u),
    // As entered (in `lengthUnit`) and in mm.
    input: {
      /** Side along X, in the record's `lengthUnit`. */
      sideX: inUnit(row.sideXMm, u),
      /** Side along Y, in the record's `lengthUnit`. */
      sideY: inUnit(row.sideYMm, u),
      /** Diagonal from the X0 Y0 corner, in the record's `lengthUnit`. */
      diagonal1: inUnit(row.diagonal1Mm, u),
      /** The other diagonal, in the record's `lengthUnit`. */
      diagonal2: inUnit(row.diagonal2Mm, u),
      /** Distance between the gantry's two bearing rails, in the record's `lengthUnit`. */
      gantrySpan: row.gantrySpanMm == null ? null : inUnit(row.gantrySpanMm, u),
    },
    inputMm: {
      /** Side along X, mm. */
      sideX: finiteOrNull(row.sideXMm),
      /** Side along Y, mm. */
      sideY: finiteOrNull(row.sideYMm),
      /** Diagonal from the X0 Y0 corner, mm. */
      diagonal1: finiteOrNull(row.diagonal1Mm),
      /** The other diagonal, mm. */
      diagonal2: finiteOrNull(row.diagonal2Mm),
      /** Distance between the gantry's two bearing rails, mm. */
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
    /** Smallest step of the height gauge, in the record's `readingUnit`. */
    resolution: row.resolutionMm == null ? null : inUnit(row.resolutionMm, row.readingUnit),
    /** Count of rows of the grid (along Y). */
    rows: row.rows ?? result?.rows ?? null,
    /** Count of columns of the grid (along X). */
    columns: row.columns ?? result?.columns ?? null,
    // Positions as entered (in `lengthUnit`), heights as entered (in `readingUnit`); the result is in mm.
    points: (Array.isArray(row.points) ? row.points : []).map((p) => ({
      /** Position along X, in the record's `lengthUnit`. */
      x: inUnit(field(p, 'xMm'), row.lengthUnit),
      /** Position along Y, in the record's `lengthUnit`. */
      y: inUnit(field(p, 'yMm'), row.lengthUnit),
      /** Height read, in the record's `readingUnit`. */
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
    /** Thickness of the plate cut, in the record's `lengthUnit`. */
    plateThickness: row.plateThicknessMm == null ? null : inUnit(row.plateThicknessMm, u),
    plateThicknessMm: finiteOrNull(row.plateThicknessMm),
    /** Smallest step of the caliper or rule the sizes were read with, in the record's `lengthUnit`. */
    resolution: row.resolutionMm == null ? null : inUnit(row.resolutionMm, u),
    nominal: {
      /** Commanded size of the square along X, in the record's `lengthUnit`. */
      x: inUnit(field(nominal, 'xMm'), u),
      /** Commanded size of the square along Y, in the record's `lengthUnit`. */
      y: inUnit(field(nominal, 'yMm'), u),
      /** Commanded diameter of the circle, in the record's `lengthUnit`. */
      circle: inUnit(field(nominal, 'circleMm'), u),
    },
    measured: {
      /** Measured size of the square along X, in the record's `lengthUnit`. */
      x: inUnit(field(measured, 'xMm'), u),
      /** Measured size of the square along Y, in the record's `lengthUnit`. */
      y: inUnit(field(measured, 'yMm'), u),
      /** Measured diagonal from the X0 Y0 corner, in the record's `lengthUnit`. */
      diagonal1: inUnit(field(measured, 'diagonal1Mm'), u),
      /** Measured other diagonal, in the record's `lengthUnit`. */
      diagonal2: inUnit(field(measured, 'diagonal2Mm'), u),
      /** Measured diameter of the circle along X, in the record's `lengthUnit`. */
      circleX: inUnit(field(measured, 'circleXMm'), u),
      /** Measured diameter of the circle along Y, in the record's `lengthUnit`. */
      circleY: inUnit(field(measured, 'circleYMm'), u),
      /** Width of cut the controller did not compensate for, in the record's `lengthUnit`. */
      kerf: inUnit(field(s, 'kerfMm'), u),
    },
    circleKind: (field(s, 'circleKind') ?? null) as TestCutRow['sizes']['circleKind'] | null,
    stepsPerMm: (field(s, 'stepsPerMm') ?? null) as TestCutRow['sizes']['stepsPerMm'] | null,
    result,
    ...unreadable(result),
  };
}

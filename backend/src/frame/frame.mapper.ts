import type { TargetValue } from '../database/schema/target-sets.js';
import { fromMm, type LengthUnit } from '../engine/units.js';
import type { CheckStatus } from '../records/readiness.js';
import type { BedGridResult } from './bed-grid-result.js';
import type { DiagonalCheckResult } from './diagonal-check-result.js';
import type { CheckRecordRow } from '../records/check-record-tables.js';

type DiagonalCheckRow = CheckRecordRow<'diagonal-check'>;
type BedGridRow = CheckRecordRow<'bed-grid'>;
type TestCutRow = CheckRecordRow<'test-cut'>;
import type { TestCutResult } from './test-cut-result.js';
import { finiteOrNull, UNREADABLE_INPUT } from '../common/stored-result.js';
import type { ResultWarning } from '../engine/warnings.js';

export type FrameStatus = Exclude<CheckStatus, 'waived' | 'not-started'>;

export interface JudgedTarget extends TargetValue {
  label: string;
}

interface Common {
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

function common(
  row: DiagonalCheckRow | BedGridRow | TestCutRow,
  status: FrameStatus,
  target: JudgedTarget,
  locked: boolean,
  warnings: ResultWarning[],
): Common {
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
) {
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
) {
  return {
    ...common(row, status, target, locked, warnings),
    /** Unit the heights (and the gauge's resolution) were read in and are given back in. */
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
  target: { part: JudgedTarget; squareness: JudgedTarget },
  locked: boolean,
  warnings: ResultWarning[],
) {
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

export type DiagonalCheckResponse = ReturnType<typeof toDiagonalCheckResponse>;
export type BedGridResponse = ReturnType<typeof toBedGridResponse>;
export type TestCutResponse = ReturnType<typeof toTestCutResponse>;

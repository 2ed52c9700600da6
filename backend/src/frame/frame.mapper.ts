import type { TargetValue } from '../database/schema/target-sets.js';
import { fromMm, type LengthUnit } from '../engine/units.js';
import type { CheckStatus } from '../records/readiness.js';
import type { BedGridResult } from './bed-grid-result.js';
import type { DiagonalCheckResult } from './diagonal-check-result.js';
import type { BedGridRow, DiagonalCheckRow, TestCutRow } from './frame.repository.js';
import type { TestCutResult } from './test-cut-result.js';

export type FrameStatus = Exclude<CheckStatus, 'waived' | 'not-started'>;

export interface JudgedTarget extends TargetValue {
  label: string;
}

interface Common {
  id: string;
  machineId: string;
  unit: LengthUnit;
  note: string;
  recordedBy: { id: string | null; name: string };
  recordedAt: string;
  status: FrameStatus;
  target: JudgedTarget;
  locked: boolean;
}

function common(row: DiagonalCheckRow | BedGridRow | TestCutRow, status: FrameStatus, target: JudgedTarget, locked: boolean): Common {
  return {
    id: row.id,
    machineId: row.machineId,
    unit: row.unit,
    note: row.note,
    recordedBy: { id: row.recordedById, name: row.recordedByName },
    recordedAt: row.recordedAt.toISOString(),
    status,
    target,
    locked,
  };
}

// Back in the entered unit; 12 significant digits drop the binary noise of the round trip through mm.
const inUnit = (mm: number, unit: LengthUnit) => Number(fromMm(mm, unit).toPrecision(12));

export function toDiagonalCheckResponse(row: DiagonalCheckRow, result: DiagonalCheckResult, status: FrameStatus, target: JudgedTarget, locked: boolean) {
  const u = row.unit;
  return {
    ...common(row, status, target, locked),
    // As entered (in `unit`) and in mm.
    input: {
      sideX: inUnit(row.sideXMm, u),
      sideY: inUnit(row.sideYMm, u),
      diagonal1: inUnit(row.diagonal1Mm, u),
      diagonal2: inUnit(row.diagonal2Mm, u),
      gantrySpan: row.gantrySpanMm == null ? null : inUnit(row.gantrySpanMm, u),
    },
    inputMm: { sideX: row.sideXMm, sideY: row.sideYMm, diagonal1: row.diagonal1Mm, diagonal2: row.diagonal2Mm, gantrySpan: row.gantrySpanMm },
    result,
  };
}

export function toBedGridResponse(row: BedGridRow, result: BedGridResult, status: FrameStatus, target: JudgedTarget, locked: boolean) {
  return {
    ...common(row, status, target, locked),
    rows: row.rows ?? result.rows,
    columns: row.columns ?? result.columns,
    // Positions in mm, heights as entered (in `unit`).
    points: row.points.map((p) => ({ x: p.xMm, y: p.yMm, z: inUnit(p.zMm, row.unit) })),
    result,
  };
}

export function toTestCutResponse(row: TestCutRow, result: TestCutResult, status: FrameStatus, target: { part: JudgedTarget; squareness: JudgedTarget }, locked: boolean) {
  const u = row.unit;
  const s = row.sizes;
  return {
    ...common(row, status, target.part, locked),
    targets: target,
    nominal: { x: inUnit(s.nominal.xMm, u), y: inUnit(s.nominal.yMm, u), circle: inUnit(s.nominal.circleMm, u) },
    measured: {
      x: inUnit(s.measured.xMm, u),
      y: inUnit(s.measured.yMm, u),
      diagonal1: inUnit(s.measured.diagonal1Mm, u),
      diagonal2: inUnit(s.measured.diagonal2Mm, u),
      circleX: inUnit(s.measured.circleXMm, u),
      circleY: inUnit(s.measured.circleYMm, u),
      kerf: inUnit(s.kerfMm, u),
    },
    circleKind: s.circleKind,
    stepsPerMm: s.stepsPerMm,
    result,
  };
}

export type DiagonalCheckResponse = ReturnType<typeof toDiagonalCheckResponse>;
export type BedGridResponse = ReturnType<typeof toBedGridResponse>;
export type TestCutResponse = ReturnType<typeof toTestCutResponse>;

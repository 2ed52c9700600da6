import type { machines } from '../database/schema/index.js';
import { fromMm, type LengthUnit } from '../engine/units.js';

// Shown as typed: ten significant figures drop the binary noise of converting back from mm.
const inUnit = (mm: number, unit: LengthUnit) => +fromMm(mm, unit).toPrecision(10);
import type { BlockingCheckRef } from '../database/schema/machine-readiness.js';
import type { ReadinessCounts } from '../records/readiness-summary.service.js';

export type MachineRow = typeof machines.$inferSelect;

export interface MachineResponse {
  id: string;
  name: string;
  kind: MachineRow['kind'];
  state: MachineRow['state'];
  /** Usable cutting area along X and Y, in mm. */
  workArea: {
    /** Along X, mm. */
    x: number;
    /** Along Y, mm. */
    y: number;
  };
  /** The unit the work area was typed in and is shown in. */
  lengthUnit: LengthUnit;
  /** The work area along X and Y, in lengthUnit. */
  workAreaInLengthUnit: {
    /** Along X, in `lengthUnit`. */
    x: number;
    /** Along Y, in `lengthUnit`. */
    y: number;
  };
  notes: string;
  targetSet: { id: string; name: string };
  lastActivityAt: string;
  createdAt: string;
  updatedAt: string;
}

export interface MachineListItem extends MachineResponse {
  /** Numbers of required checks, counted as the readiness board counts (waivers applied); `blocking` names the first check that stops approval. */
  checks: {
    /** Count of required checks. */
    total: number;
    /** Count of checks within their targets. */
    within: number;
    /** Count of checks outside their targets. */
    outside: number;
    /** Count of checks waived. */
    waived: number;
    /** Count of checks not yet recorded. */
    notStarted: number;
    blocking: BlockingCheckRef | null;
  };
}

export function toMachineResponse(row: MachineRow, targetSetName: string): MachineResponse {
  return {
    id: row.id,
    name: row.name,
    kind: row.kind,
    state: row.state,
    workArea: { x: row.workAreaXMm, y: row.workAreaYMm },
    lengthUnit: row.lengthUnit,
    workAreaInLengthUnit: { x: inUnit(row.workAreaXMm, row.lengthUnit), y: inUnit(row.workAreaYMm, row.lengthUnit) },
    notes: row.notes,
    targetSet: { id: row.targetSetId, name: targetSetName },
    lastActivityAt: row.lastActivityAt.toISOString(),
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

export function toListChecks(c: ReadinessCounts): MachineListItem['checks'] {
  return {
    total: c.total,
    within: c.within,
    outside: c.outside,
    waived: c.waived,
    notStarted: c.notStarted,
    blocking: c.firstBlocking,
  };
}

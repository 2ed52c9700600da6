import { boltDownSession, type SessionHoleInput } from '../engine/bolt-down-session.js';
import { fromMm } from '../engine/units.js';
import type { BoltDownHoleRow, BoltDownRow } from './bolt-downs.repository.js';
import { finiteList, UNREADABLE_INPUT } from '../common/stored-result.js';

export interface BoltDownHoleResponse {
  /** The hole along the rail from its start, index from 0. */
  index: number;
  /** Hole centre, mm from the rail's start; `at` the same in the bolt-down's lengthUnit. */
  position: number;
  /** Hole centre from the rail's start, in the bolt-down's lengthUnit. */
  at: number;
  /** Rank in the proposed fixing order, index from 0 (0 = first). */
  order: number;
  /** Reading to aim for, in the bolt-down's readingUnit (null until the first hole is fixed). */
  target: number | null;
  targetMm: number | null;
  /** Reading as typed, in the bolt-down's readingUnit. */
  reading: number | null;
  readingMm: number | null;
  /** reading − target, in the bolt-down's readingUnit. */
  difference: number | null;
  /** Within ±band of the aim (null when there is no reading or no aim yet). */
  onTarget: boolean | null;
  fixed: boolean;
  fixedAt: string | null;
  fixedBy: string | null;
}

export interface BoltDownResponse {
  id: string;
  railId: string;
  machineId: string;
  /** The rail bolted down; its length in mm. */
  rail: { label: string; axis: string; lengthMm: number };
  mode: BoltDownRow['mode'];
  /** Readings, aims and the band are in readingUnit; hole positions `at` in lengthUnit (`position` in mm). */
  readingUnit: BoltDownRow['readingUnit'];
  lengthUnit: BoltDownRow['lengthUnit'];
  /** Half-width around the aim that counts as on target, in readingUnit (`bandMm`: in mm). */
  band: number;
  bandMm: number;
  holes: BoltDownHoleResponse[];
  /** The hole to fix next, index from 0 along the rail (null when every hole is fixed). */
  nextHole: number | null;
  /** Count of holes fixed. */
  fixedCount: number;
  /** Count of holes the rail has. */
  holeCount: number;
  complete: boolean;
  finalSweepId: string | null;
  /** Set when the bolt-down was given up: when, by whom and why. No hole is written after it. */
  abandoned: { at: string; by: string | null; reason: string } | null;
  createdBy: string;
  createdAt: string;
  updatedAt: string;
  /** Present when the stored hole positions, band or readings cannot be read: holes is then empty. */
  unreadable?: string;
}

/** A hole write's answer: the whole bolt-down, and whether this write was a repeat of one already applied. */
export interface HoleWriteResponse extends BoltDownResponse {
  writeId: string;
  repeated: boolean;
}

export function sessionOf(row: BoltDownRow, holes: BoltDownHoleRow[]) {
  const inputs = new Map<number, SessionHoleInput>(
    holes.map((h) => [h.holeIndex, { readingMm: h.readingMm, fixed: h.fixed, fixSeq: h.fixSeq }]),
  );
  return boltDownSession(row.holePositionsMm, row.mode, inputs);
}

// Binary rounding of unit conversions (0.3 thou → mm → thou) must not read as a miss of the band.
const BAND_SLACK_MM = 1e-12;

/** The guide's state, or null when an old stored row holds a position, band or reading that is not a finite number. */
function readableSession(row: BoltDownRow, holes: BoltDownHoleRow[]) {
  const readingsOk = holes.every(
    (h) =>
      (h.readingMm === null || Number.isFinite(h.readingMm)) &&
      (h.readingRaw === null || Number.isFinite(h.readingRaw)),
  );
  if (!finiteList(row.holePositionsMm) || !Number.isFinite(row.bandMm) || !readingsOk) return null;
  try {
    return sessionOf(row, holes);
  } catch {
    return null;
  }
}

export function toBoltDownResponse(
  row: BoltDownRow,
  holes: BoltDownHoleRow[],
  rail: BoltDownResponse['rail'],
): BoltDownResponse {
  const session = readableSession(row, holes);
  if (!session) {
    return {
      id: row.id,
      railId: row.railId,
      machineId: row.machineId,
      rail,
      mode: row.mode,
      readingUnit: row.readingUnit,
      lengthUnit: row.lengthUnit,
      band: fromMm(row.bandMm, row.readingUnit),
      bandMm: row.bandMm,
      holes: [],
      nextHole: null,
      fixedCount: holes.filter((h) => h.fixed).length,
      holeCount: Array.isArray(row.holePositionsMm) ? row.holePositionsMm.length : 0,
      complete: false,
      finalSweepId: row.finalSweepId,
      abandoned: abandonedOf(row),
      createdBy: row.createdByName,
      createdAt: row.createdAt.toISOString(),
      updatedAt: row.updatedAt.toISOString(),
      unreadable: UNREADABLE_INPUT,
    };
  }
  const byIndex = new Map(holes.map((h) => [h.holeIndex, h]));
  const inUnit = (mm: number | null) => (mm === null ? null : fromMm(mm, row.readingUnit));
  return {
    id: row.id,
    railId: row.railId,
    machineId: row.machineId,
    rail,
    mode: row.mode,
    readingUnit: row.readingUnit,
    lengthUnit: row.lengthUnit,
    band: fromMm(row.bandMm, row.readingUnit),
    bandMm: row.bandMm,
    holes: session.holes.map((h) => {
      const stored = byIndex.get(h.index);
      return {
        index: h.index,
        position: h.positionMm,
        at: Number(fromMm(h.positionMm, row.lengthUnit).toPrecision(15)),
        order: h.order,
        target: inUnit(h.targetMm),
        targetMm: h.targetMm,
        // The raw value as typed, not a round trip through mm.
        reading: stored?.readingRaw ?? null,
        readingMm: h.readingMm,
        difference: inUnit(h.differenceMm),
        onTarget: h.differenceMm === null ? null : Math.abs(h.differenceMm) <= row.bandMm + BAND_SLACK_MM,
        fixed: h.fixed,
        fixedAt: stored?.fixed && stored.fixedAt ? stored.fixedAt.toISOString() : null,
        fixedBy: stored?.fixed ? stored.fixedByName : null,
      };
    }),
    nextHole: session.nextHole,
    fixedCount: session.fixedCount,
    holeCount: row.holePositionsMm.length,
    complete: session.complete,
    finalSweepId: row.finalSweepId,
    abandoned: abandonedOf(row),
    createdBy: row.createdByName,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

function abandonedOf(row: BoltDownRow): BoltDownResponse['abandoned'] {
  return row.abandonedAt
    ? { at: row.abandonedAt.toISOString(), by: row.abandonedByName, reason: row.abandonedReason ?? '' }
    : null;
}

import { fromMm } from '../engine/units.js';
import type {
  PatternEntryKind,
  PatternReference,
  PatternUnit,
  StoredHole,
  StoredPatternEntry,
} from '../database/schema/hole-patterns.js';
import type { HolePatternRow } from './hole-patterns.repository.js';

export interface HolePatternResponse {
  id: string;
  machineId: string;
  name: string;
  reference: PatternReference;
  lengthUnit: PatternUnit;
  /** Outline width in mm; `width`/`height` as entered, in lengthUnit. */
  widthMm: number;
  /** Outline height in mm. */
  heightMm: number;
  /** Outline width as entered, in lengthUnit. */
  width: number;
  /** Outline height as entered, in lengthUnit. */
  height: number;
  entry: PatternEntryKind;
  /** The entry as typed, in lengthUnit (positions, pitches and diameters; counts are counts): one of these is set, matching `entry`. */
  holesEntered:
    | {
        /** Hole centre from the outline's left edge, in `lengthUnit`. */
        x: number;
        /** Hole centre from the outline's lower edge, in `lengthUnit`. */
        y: number;
        /** Hole diameter, in `lengthUnit`. */
        diameter: number;
      }[]
    | null;
  /** A grid entry as typed: origin, pitches and diameter in lengthUnit. */
  grid: Omit<Extract<StoredPatternEntry, { kind: 'grid' }>, 'kind'> | null;
  /** A bolt-circle entry as typed: centre and diameters in lengthUnit. */
  circle: Omit<Extract<StoredPatternEntry, { kind: 'circle' }>, 'kind'> | null;
  /** Every hole centre and diameter, mm, from the outline's lower-left corner. */
  holes: StoredHole[];
  notes: string;
  createdAt: string;
  updatedAt: string;
}

export interface PatternPreviewResponse {
  widthMm: number;
  heightMm: number;
  holes: StoredHole[];
}

const inUnit = (mm: number, unit: PatternUnit) => (unit === 'mm' ? mm : Number(fromMm(mm, unit).toPrecision(15)));

export function toHolePatternResponse(row: HolePatternRow): HolePatternResponse {
  const { kind, ...params } = row.entry;
  return {
    id: row.id,
    machineId: row.machineId,
    name: row.name,
    reference: row.reference,
    lengthUnit: row.lengthUnit,
    widthMm: row.widthMm,
    heightMm: row.heightMm,
    width: inUnit(row.widthMm, row.lengthUnit),
    height: inUnit(row.heightMm, row.lengthUnit),
    entry: kind,
    holesEntered: row.entry.kind === 'list' ? row.entry.holes : null,
    grid: row.entry.kind === 'grid' ? (params as HolePatternResponse['grid']) : null,
    circle: row.entry.kind === 'circle' ? (params as HolePatternResponse['circle']) : null,
    holes: row.holes,
    notes: row.notes,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

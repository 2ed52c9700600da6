import type { LengthUnit } from '../../lib/units';

export type PatternReference = 'bottom-left' | 'bottom-right' | 'top-left' | 'top-right' | 'left' | 'right' | 'bottom' | 'top';
/** The length unit of the outline and every coordinate (the length family). */
export type PatternUnit = LengthUnit;
export type PatternEntry = 'list' | 'grid' | 'circle';
export type Paper = 'a4' | 'letter';

export interface HoleEntry {
  x: number;
  y: number;
  diameter: number;
}
export interface GridEntry {
  originX: number;
  originY: number;
  rows: number;
  columns: number;
  pitchX: number;
  pitchY: number;
  diameter: number;
}
export interface CircleEntry {
  centreX: number;
  centreY: number;
  circleDiameter: number;
  count: number;
  startAngleDeg: number;
  diameter: number;
}

/** A hole in mm from the outline's lower-left corner, x to the right, y upwards. */
export interface HoleMm {
  xMm: number;
  yMm: number;
  diameterMm: number;
}

export interface HolePattern {
  id: string;
  machineId: string;
  name: string;
  reference: PatternReference;
  lengthUnit: PatternUnit;
  widthMm: number;
  heightMm: number;
  width: number;
  height: number;
  entry: PatternEntry;
  holesEntered: HoleEntry[] | null;
  grid: GridEntry | null;
  circle: CircleEntry | null;
  holes: HoleMm[];
  notes: string;
  createdAt: string;
  updatedAt: string;
}

export interface PatternInput {
  name: string;
  reference: PatternReference;
  lengthUnit: PatternUnit;
  width: number;
  height: number;
  entry: PatternEntry;
  holes?: HoleEntry[];
  grid?: GridEntry;
  circle?: CircleEntry;
  notes?: string;
}

export interface PatternPreview {
  widthMm: number;
  heightMm: number;
  holes: HoleMm[];
}

/** A rail as the templates tab needs it: the server derives its holes. */
export interface RailForTemplate {
  id: string;
  label: string;
  axis: string;
  lengthMm: number;
  holes: { index: number; position: number }[];
}

export const REFERENCE_LABELS: Record<PatternReference, string> = {
  'bottom-left': 'Lower-left corner',
  'bottom-right': 'Lower-right corner',
  'top-left': 'Upper-left corner',
  'top-right': 'Upper-right corner',
  left: 'Left edge',
  right: 'Right edge',
  bottom: 'Lower edge',
  top: 'Upper edge',
};

export const ENTRY_LABELS: Record<PatternEntry, string> = { list: 'List of holes', grid: 'Grid', circle: 'Bolt circle' };

export const holePatternKeys = {
  all: ['hole-patterns'] as const,
  list: (machineId: string) => ['hole-patterns', 'list', machineId] as const,
  one: (id: string) => ['hole-patterns', 'one', id] as const,
  rails: (machineId: string) => ['hole-patterns', 'rails', machineId] as const,
  preview: (input: PatternInput | null) => ['hole-patterns', 'preview', input] as const,
};

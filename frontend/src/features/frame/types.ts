import type { LengthUnit } from '../../lib/units';

/** Something to know about a result that does not change its number (server: engine/warnings.ts). */
export interface ResultWarning {
  code: string;
  message: string;
}

export type FrameStatus = 'within-target' | 'outside-target';

export interface JudgedTarget {
  value: number;
  unit: string;
  source?: string;
  label: string;
}

interface RecordCommon {
  id: string;
  machineId: string;
  /** Unit the record's lengths were entered in. */
  lengthUnit: LengthUnit;
  note: string;
  recordedBy: { id: string | null; name: string };
  recordedAt: string;
  status: FrameStatus;
  target: JudgedTarget;
  locked: boolean;
  warnings: ResultWarning[];
}

export interface DiagonalCheck extends RecordCommon {
  /** Smallest step of the tape or rule, in lengthUnit (null: not recorded). */
  resolution: number | null;
  input: { sideX: number; sideY: number; diagonal1: number; diagonal2: number; gantrySpan: number | null };
  inputMm: { sideX: number; sideY: number; diagonal1: number; diagonal2: number; gantrySpan: number | null };
  result: {
    outOfSquareRad: number;
    outOfSquareDeg: number;
    outOfSquareArcsec: number;
    mmPerMetre: number;
    longDiagonal: 1 | 2;
    diagonalDifferenceMm: number;
    warnings: string[];
    correction: {
      moveMm: number;
      spanMm: number;
      end: 'x-far' | 'x0' | null;
      towards: 'y0' | null;
      instruction: string;
    };
  } | null;
  /** Present when the record's stored measurements cannot be read (result is then null). */
  unreadable?: string;
}

export interface GridPointResult {
  index: number;
  row: number;
  column: number;
  xMm: number;
  yMm: number;
  zMm: number;
  residualMm: number;
  zoneResidualMm: number;
  judgedHeightMm: number;
}

export type BedJudgedBasis = 'height-range' | 'minimum-zone';

export interface BedGrid extends RecordCommon {
  /** Unit the heights were read in. */
  readingUnit: LengthUnit;
  resolution: number | null;
  rows: number;
  columns: number;
  points: { x: number; y: number; z: number }[];
  result: {
    leastSquares: { a: number; b: number; c: number; flatness: number; flatnessMm: number };
    minimumZone: { a: number; b: number; c: number; flatnessMm: number };
    heightRange: { rangeMm: number };
    judged: { basis: BedJudgedBasis; label: string; valueMm: number };
    tilt: { xMmPerMetre: number; yMmPerMetre: number; mmPerMetre: number; directionDeg: number };
    points: GridPointResult[];
    highest: GridPointResult;
    lowest: GridPointResult;
    worstPoints: GridPointResult[];
    rows: number;
    columns: number;
  } | null;
  /** Present when the record's stored measurements cannot be read (result is then null). */
  unreadable?: string;
}

export interface AxisReading {
  commandedMm: number;
  measuredMm: number;
  afterKerfMm: number;
  errorMm: number;
  errorPercent: number;
  correctionFactor: number;
  suggestedStepsPerMm: number | null;
}

export interface PartSizeCheck {
  part: string;
  label: string;
  nominalMm: number;
  afterKerfMm: number;
  deviationMm: number;
  toleranceMm: number;
  toleranceBasis: string;
  sizeBandMm: [number, number] | null;
  thicknessBandMm: [number, number] | null;
  outsideBand: string | null;
  within: boolean;
}

export interface TestCut extends RecordCommon {
  targets: { part: JudgedTarget; squareness: JudgedTarget };
  plateThickness: number | null;
  plateThicknessMm: number | null;
  resolution: number | null;
  nominal: { x: number; y: number; circle: number };
  measured: {
    x: number;
    y: number;
    diagonal1: number;
    diagonal2: number;
    circleX: number;
    circleY: number;
    kerf: number;
  };
  circleKind: 'hole' | 'disc';
  stepsPerMm: { x: number | null; y: number | null };
  result: {
    scaleErrorX: number;
    scaleErrorY: number;
    x: AxisReading;
    y: AxisReading;
    outOfSquareArcsec: number;
    squareness: {
      outOfSquareDeg: number;
      mmPerMetre: number;
      longDiagonal: 1 | 2;
      diagonalDifferenceMm: number;
      warnings: string[];
    };
    ovality: number;
    ovalityPointsTo: 'round' | 'scale' | 'x-backlash' | 'y-backlash';
    ovalityExplanation: string;
    ovalityToleranceMm: number;
    parts: PartSizeCheck[];
    notes: string[];
  } | null;
  /** Present when the record's stored measurements cannot be read (result is then null). */
  unreadable?: string;
}

/** One key factory for the feature. */
export const frameKeys = {
  all: ['frame'] as const,
  diagonalChecks: (machineId: string) => [...frameKeys.all, 'diagonal-checks', machineId] as const,
  bedGrids: (machineId: string) => [...frameKeys.all, 'bed-grids', machineId] as const,
  testCuts: (machineId: string) => [...frameKeys.all, 'test-cuts', machineId] as const,
};

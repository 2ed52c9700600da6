import type { Schemas } from '../../lib/api/schemas';

/** Something to know about a result that does not change its number. */
export type ResultWarning = Schemas['ResultWarning'];
export type JudgedTarget = Schemas['JudgedTarget'];

/** Lengths as entered, in `lengthUnit`, and in mm; `result` null (with `unreadable`) when the stored measurements cannot be read. */
export type DiagonalCheck = Schemas['DiagonalCheckResponse'];
export type FrameStatus = DiagonalCheck['status'];

/** Positions in `lengthUnit`, heights in `readingUnit`; the result in mm. */
export type BedGrid = Schemas['BedGridResponse'];
export type GridPointResult = Schemas['BedGridPointResult'];
export type BedJudgedBasis = Schemas['BedGridResult']['judged']['basis'];

export type TestCut = Schemas['TestCutResponse'];
export type AxisReading = Schemas['AxisReading'];
export type PartSizeCheck = Schemas['PartSizeCheck'];

/** One key factory for the feature. */
export const frameKeys = {
  all: ['frame'] as const,
  diagonalChecks: (machineId: string) => [...frameKeys.all, 'diagonal-checks', machineId] as const,
  bedGrids: (machineId: string) => [...frameKeys.all, 'bed-grids', machineId] as const,
  testCuts: (machineId: string) => [...frameKeys.all, 'test-cuts', machineId] as const,
};

import type { DriveRecord, StepsChange } from '../database/schema/drives.js';
import { evaluateDrive } from '../engine/steps-per-mm.js';
import type { AxisRow } from './axes.repository.js';
import { axisLetter, describeDrive, toEngineDrive } from './drive-record.js';

export interface AxisCheckSummary {
  status: 'not-started' | 'within-target' | 'outside-target' | 'not-applicable';
  summary: string;
  /** The result in a few words for a table cell ("−0.201 %"), or null when nothing is recorded. */
  headline: string | null;
  recordId: string | null;
  recordedAt: string | null;
}

export interface AxisResponse {
  id: string;
  machineId: string;
  name: string;
  /** G-code letter the axis moves under (Y1 and Y2 are both Y), or null. */
  letter: string | null;
  drive: DriveRecord;
  driveSummary: string;
  motorStepsPerRev: number;
  microsteps: number;
  gearRatio: number;
  stepsPerMm: number;
  theoreticalStepsPerMm: number;
  /** Value in use against the drive's theoretical value, %. */
  stepsPerMmDifferencePercent: number;
  travelPerRevMm: number;
  resolutionMm: number;
  maxFeedRate: number | null;
  measuredTravelMm: number | null;
  notes: string;
  stepsHistory: StepsChange[];
  locked: boolean;
  createdAt: string;
  updatedAt: string;
}

export function toAxisResponse(row: AxisRow, locked: boolean): AxisResponse {
  const d = evaluateDrive(toEngineDrive(row.drive, row));
  return {
    id: row.id,
    machineId: row.machineId,
    name: row.name,
    letter: axisLetter(row.name),
    drive: row.drive,
    driveSummary: describeDrive(row.drive),
    motorStepsPerRev: row.motorStepsPerRev,
    microsteps: row.microsteps,
    gearRatio: row.gearRatio,
    stepsPerMm: row.stepsPerMm,
    theoreticalStepsPerMm: d.stepsPerMm,
    stepsPerMmDifferencePercent: ((row.stepsPerMm - d.stepsPerMm) / d.stepsPerMm) * 100,
    travelPerRevMm: d.travelPerRevMm,
    resolutionMm: d.resolutionMm,
    maxFeedRate: row.maxFeedRateMmPerMin,
    measuredTravelMm: row.measuredTravelMm,
    notes: row.notes,
    stepsHistory: row.stepsHistory,
    locked,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

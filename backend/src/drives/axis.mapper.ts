import type { DriveRecord, StepsChange } from '../database/schema/drives.js';
import { evaluateDrive } from '../engine/steps-per-mm.js';
import type { AxisRow } from './axes.repository.js';
import { axisLetter, describeDrive, driveInUnit, tidy, toEngineDrive } from './drive-record.js';
import type { LengthUnit } from '../engine/units.js';

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
  /** The unit the axis is set up in: drive lengths, feed rates (per minute) and travel below are in it. */
  lengthUnit: LengthUnit;
  /** The drive's lengths in lengthUnit (the pinion module in mm, as always). */
  drive: DriveRecord;
  /** The same drive in mm. */
  driveMm: DriveRecord;
  driveSummary: string;
  /** Full steps per motor revolution. */
  motorStepsPerRev: number;
  /** Microsteps per full step set on the driver (a count). */
  microsteps: number;
  /** Motor turns per turn of the screw or pinion (no unit). */
  gearRatio: number;
  /** Steps per mm in use in the controller. */
  stepsPerMm: number;
  /** Steps per mm the drive's geometry gives. */
  theoreticalStepsPerMm: number;
  /** Value in use against the drive's theoretical value, %. */
  stepsPerMmDifferencePercent: number;
  /** Steps per inch (× 25.4), shown beside steps per mm for axes set up in inches. */
  stepsPerInch: number;
  /** Steps per inch the drive's geometry gives (× 25.4). */
  theoreticalStepsPerInch: number;
  travelPerRevMm: number;
  /** Travel per revolution in lengthUnit. */
  travelPerRev: number;
  resolutionMm: number;
  /** Fastest feed, lengthUnit per minute. */
  maxFeedRate: number | null;
  maxFeedRateMmPerMin: number | null;
  /** Measured travel in lengthUnit. */
  measuredTravel: number | null;
  measuredTravelMm: number | null;
  notes: string;
  stepsHistory: StepsChange[];
  locked: boolean;
  createdAt: string;
  updatedAt: string;
}

export function toAxisResponse(row: AxisRow, locked: boolean): AxisResponse {
  const d = evaluateDrive(toEngineDrive(row.drive, row));
  const unit = row.lengthUnit as LengthUnit;
  return {
    id: row.id,
    machineId: row.machineId,
    name: row.name,
    letter: axisLetter(row.name),
    lengthUnit: unit,
    drive: driveInUnit(row.drive, unit),
    driveMm: row.drive,
    driveSummary: describeDrive(row.drive, unit),
    motorStepsPerRev: row.motorStepsPerRev,
    microsteps: row.microsteps,
    gearRatio: row.gearRatio,
    stepsPerMm: row.stepsPerMm,
    theoreticalStepsPerMm: d.stepsPerMm,
    stepsPerMmDifferencePercent: ((row.stepsPerMm - d.stepsPerMm) / d.stepsPerMm) * 100,
    // 1 in = 25.4 mm exactly, so steps per inch = steps per mm × 25.4.
    stepsPerInch: row.stepsPerMm * 25.4,
    theoreticalStepsPerInch: d.stepsPerMm * 25.4,
    travelPerRevMm: d.travelPerRevMm,
    travelPerRev: tidy(d.travelPerRevMm, unit),
    resolutionMm: d.resolutionMm,
    maxFeedRate: row.maxFeedRateMmPerMin === null ? null : tidy(row.maxFeedRateMmPerMin, unit),
    maxFeedRateMmPerMin: row.maxFeedRateMmPerMin,
    measuredTravel: row.measuredTravelMm === null ? null : tidy(row.measuredTravelMm, unit),
    measuredTravelMm: row.measuredTravelMm,
    notes: row.notes,
    stepsHistory: row.stepsHistory,
    locked,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

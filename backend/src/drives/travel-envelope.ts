import type { TargetValue } from '../database/schema/target-sets.js';
import { evaluateTravelEnvelope } from '../engine/travel-envelope.js';
import type { MachineRef } from '../records/readiness.js';
import type { AxisRow } from './axes.repository.js';
import { axisLetter } from './drive-record.js';
import type { DriveTargets } from './drive-targets.js';

export interface TravelEnvelopeResponse {
  machineId: string;
  status: 'within-target' | 'outside-target' | 'not-started';
  /** The machine's work area along X and Y, in mm. */
  workArea: {
    /** Along X, mm. */
    x: number;
    /** Along Y, mm. */
    y: number;
  };
  /** The target set's travel margin, as stored with its unit. */
  margin: TargetValue;
  marginMm: number;
  /**
   * Each X and Y axis, every length in mm: its measured travel, the work size along it, the travel
   * it needs (work size plus the margin) and what is spare (negative when short).
   */
  axes: {
    axisId: string;
    axis: string;
    letter: 'X' | 'Y';
    /** Measured travel of the axis, mm (null until measured). */
    measuredTravel: number | null;
    /** Work size along the axis, mm. */
    workSize: number;
    /** Work size plus the margin at each end, mm. */
    requiredTravel: number;
    /** Measured travel minus required travel, mm (negative when short). */
    spare: number | null;
    covers: boolean | null;
  }[];
  /** What is still missing before the check can be made, in words. */
  missing: string[];
  summary: string;
}

/**
 * Every X and Y axis record (both sides of a dual-drive gantry count) must travel the work
 * area plus the target set's margin. The margin is for the whole axis, so half goes each side.
 */
export function travelEnvelopeOf(machine: MachineRef, rows: AxisRow[], targets: DriveTargets): TravelEnvelopeResponse {
  const marginMm = targets.travelMargin.base;
  const workArea = { x: machine.workAreaXMm, y: machine.workAreaYMm };
  const relevant = rows
    .map((r) => ({ row: r, letter: axisLetter(r.name) }))
    .filter((a): a is { row: AxisRow; letter: 'X' | 'Y' } => a.letter === 'X' || a.letter === 'Y');
  const missing: string[] = [];
  for (const l of ['X', 'Y'] as const)
    if (!relevant.some((a) => a.letter === l)) missing.push(l === 'X' ? 'an X axis' : 'a Y axis');
  for (const a of relevant) if (a.row.measuredTravelMm == null) missing.push(`the measured travel of ${a.row.name}`);
  const measured = relevant.filter((a) => a.row.measuredTravelMm != null);
  const result = measured.length
    ? evaluateTravelEnvelope({
        axes: measured.map((a) => ({
          axis: a.row.name,
          measuredTravelMm: a.row.measuredTravelMm!,
          workSizeMm: a.letter === 'X' ? workArea.x : workArea.y,
        })),
        marginPerSideMm: marginMm / 2,
      })
    : null;
  const axes = relevant.map((a) => {
    const workSize = a.letter === 'X' ? workArea.x : workArea.y;
    const found = result?.axes.find((r) => r.axis === a.row.name);
    return {
      axisId: a.row.id,
      axis: a.row.name,
      letter: a.letter,
      measuredTravel: a.row.measuredTravelMm,
      workSize,
      requiredTravel: workSize + marginMm,
      spare: found ? found.spareMm : null,
      covers: found ? found.covers : null,
    };
  });
  const short = axes.filter((a) => a.covers === false);
  const status = short.length ? 'outside-target' : missing.length ? 'not-started' : 'within-target';
  const summary = short.length
    ? `${short.map((a) => `${a.axis} is ${Math.abs(a.spare!).toFixed(1)} mm short`).join('; ')} of the work area plus ${marginMm} mm`
    : missing.length
      ? `Needs ${missing.join(', ')}`
      : `Every X and Y axis covers the ${workArea.x} × ${workArea.y} mm work area plus ${marginMm} mm`;
  return {
    machineId: machine.id,
    status,
    workArea,
    margin: targets.travelMargin.target,
    marginMm,
    axes,
    missing,
    summary,
  };
}

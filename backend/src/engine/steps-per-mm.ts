import { EngineInputError } from './engine-input-error.js';
import { requirePositive, requirePositiveInteger, requireFiniteResult } from './validate.js';

/**
 * Steps per millimetre of a stepper (or step/direction servo) axis:
 *   stepsPerMm = motorStepsPerRev × microsteps × gearRatio ÷ travelPerRev
 * where travelPerRev is the travel per revolution of the driven element: the screw lead
 * (pitch × starts), belt pitch × pulley teeth, or the pinion's pitch circumference π·m·z, and
 * gearRatio is motor revolutions per revolution of that element.
 */

export const DRIVE_TYPES = ['screw', 'belt', 'rack'] as const;
export type DriveType = (typeof DRIVE_TYPES)[number];

export interface DriveInput {
  type: DriveType;
  motorStepsPerRev: number;
  microsteps: number;
  /** Motor revolutions per revolution of the screw, pulley or pinion; 1 when direct. */
  gearRatio?: number;
  leadMm?: number;
  beltPitchMm?: number;
  pulleyTeeth?: number;
  pinionTeeth?: number;
  pinionModuleMm?: number;
}

export interface DriveResult {
  /** Travel per revolution of the screw, pulley or pinion. */
  travelPerRevMm: number;
  /** Travel per motor revolution (travelPerRev ÷ gearRatio). */
  travelPerMotorRevMm: number;
  stepsPerMm: number;
  /** Travel of one (micro)step. */
  resolutionMm: number;
}

function required(field: string, type: DriveType, value: unknown): void {
  if (value === undefined || value === null) {
    throw new EngineInputError(`${field} is required for a ${type} drive`, field);
  }
}

export function travelPerRevMm(input: DriveInput): number {
  switch (input.type) {
    case 'screw':
      required('lead', 'screw', input.leadMm);
      return requirePositive('lead', input.leadMm);
    case 'belt':
      required('beltPitch', 'belt', input.beltPitchMm);
      required('pulleyTeeth', 'belt', input.pulleyTeeth);
      return requirePositive('beltPitch', input.beltPitchMm) * requirePositiveInteger('pulleyTeeth', input.pulleyTeeth);
    case 'rack':
      required('pinionModule', 'rack', input.pinionModuleMm);
      required('pinionTeeth', 'rack', input.pinionTeeth);
      // Pitch diameter d = m·z, so one pinion turn moves the rack π·m·z.
      return (
        Math.PI *
        requirePositive('pinionModule', input.pinionModuleMm) *
        requirePositiveInteger('pinionTeeth', input.pinionTeeth)
      );
    default:
      throw new EngineInputError(`type must be one of ${DRIVE_TYPES.join(', ')}`, 'type');
  }
}

export function evaluateDrive(input: DriveInput): DriveResult {
  const travel = travelPerRevMm(input);
  const steps = requirePositiveInteger('motorStepsPerRev', input.motorStepsPerRev);
  const microsteps = requirePositive('microsteps', input.microsteps);
  const gearRatio = input.gearRatio == null ? 1 : requirePositive('gearRatio', input.gearRatio);
  const stepsPerMm = (steps * microsteps * gearRatio) / travel;
  return requireFiniteResult('the drive values', {
    travelPerRevMm: travel,
    travelPerMotorRevMm: travel / gearRatio,
    stepsPerMm,
    resolutionMm: 1 / stepsPerMm,
  });
}

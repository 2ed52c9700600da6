import { IsIn } from 'class-validator';
import { DRIVE_TYPES, type DriveType } from '../../engine/steps-per-mm.js';
import { FiniteNumber, OptionalFiniteNumber } from './validators.js';

/** Lengths in mm; which of the optional fields are needed depends on `type`. */
export class DriveDto {
  @IsIn(DRIVE_TYPES, { message: `type must be one of ${DRIVE_TYPES.join(', ')}` })
  type: DriveType;

  @FiniteNumber('motorStepsPerRev')
  motorStepsPerRev: number;

  @FiniteNumber('microsteps')
  microsteps: number;

  @OptionalFiniteNumber('gearRatio')
  gearRatio?: number;

  @OptionalFiniteNumber('lead')
  lead?: number;

  @OptionalFiniteNumber('beltPitch')
  beltPitch?: number;

  @OptionalFiniteNumber('pulleyTeeth')
  pulleyTeeth?: number;

  @OptionalFiniteNumber('pinionTeeth')
  pinionTeeth?: number;

  @OptionalFiniteNumber('pinionModule')
  pinionModule?: number;
}

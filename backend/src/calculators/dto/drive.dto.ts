import { IsIn } from 'class-validator';
import { DRIVE_TYPES, type DriveType } from '../../engine/steps-per-mm.js';
import { FiniteNumber, OptionalFiniteNumber } from './validators.js';
import { UnitFamiliesDto } from './unit-families.dto.js';

/**
 * Lead and belt pitch in `lengthUnit` (or a screw's threads per inch); the pinion's module is in
 * mm whatever the unit, as the module is defined (ISO 54). Which fields are needed depends on `type`.
 */
export class DriveCalculationDto extends UnitFamiliesDto {
  @IsIn(DRIVE_TYPES, { message: `type must be one of ${DRIVE_TYPES.join(', ')}` })
  type: DriveType;

  /** Full steps per motor revolution. */
  @FiniteNumber('motorStepsPerRev')
  motorStepsPerRev: number;

  /** Microsteps per full step set on the driver (a count). */
  @FiniteNumber('microsteps')
  microsteps: number;

  /** Motor turns per turn of the screw or pulley (no unit); 1 when absent. */
  @OptionalFiniteNumber('gearRatio')
  gearRatio?: number;

  /** Screw lead (travel per turn), in lengthUnit. */
  @OptionalFiniteNumber('lead')
  lead?: number;

  /** For an inch screw: lead = 1 in ÷ threads per inch (single start); instead of `lead`. */
  @OptionalFiniteNumber('threadsPerInch')
  threadsPerInch?: number;

  /** Belt tooth pitch, in lengthUnit. */
  @OptionalFiniteNumber('beltPitch')
  beltPitch?: number;

  /** Teeth on the drive pulley (a count). */
  @OptionalFiniteNumber('pulleyTeeth')
  pulleyTeeth?: number;

  /** Teeth on the pinion (a count). */
  @OptionalFiniteNumber('pinionTeeth')
  pinionTeeth?: number;

  /** Pinion module, in mm (a module is defined in mm whatever the unit). */
  @OptionalFiniteNumber('pinionModule')
  pinionModule?: number;
}

import { IsIn } from 'class-validator';
import { DRIVE_TYPES, type DriveType } from '../../engine/steps-per-mm.js';
import { FiniteNumber, OptionalFiniteNumber } from './validators.js';
import { UnitFamiliesDto } from './unit-families.dto.js';

/**
 * Lead and belt pitch in `lengthUnit` (or a screw's threads per inch); the pinion's module is in
 * mm whatever the unit, as the module is defined (ISO 54). Which fields are needed depends on `type`.
 */
export class DriveDto extends UnitFamiliesDto {
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

  /** For an inch screw: lead = 1 in ÷ threads per inch (single start); instead of `lead`. */
  @OptionalFiniteNumber('threadsPerInch')
  threadsPerInch?: number;

  @OptionalFiniteNumber('beltPitch')
  beltPitch?: number;

  @OptionalFiniteNumber('pulleyTeeth')
  pulleyTeeth?: number;

  @OptionalFiniteNumber('pinionTeeth')
  pinionTeeth?: number;

  @OptionalFiniteNumber('pinionModule')
  pinionModule?: number;
}

import { IsIn } from 'class-validator';
import { DRIVE_TYPES, type DriveType } from '../../engine/steps-per-mm.js';
import { MOUNTINGS, type Mounting } from '../../engine/screw-speed.js';
import { OptionalFinite } from './validators.js';
import { Optional } from '../../common/optional.js';

/**
 * An axis drive with the calculators' field names; lengths in the axis's lengthUnit (the pinion
 * module is in mm by definition). Which fields apply depends on
 * `type`; the service refuses a missing one the type needs and one it does not use.
 */
export class DriveDto {
  @IsIn(DRIVE_TYPES, { message: `drive.type must be one of ${DRIVE_TYPES.join(', ')}` })
  type: DriveType;

  /** Screw lead (travel per turn), in the axis's `lengthUnit`. */
  @OptionalFinite('drive.lead')
  lead?: number;

  /** A single-start screw's lead given as threads per inch (lead = 1/threadsPerInch in), in place of lead. */
  @OptionalFinite('drive.threadsPerInch')
  threadsPerInch?: number;

  /** Screw's nominal (outside) diameter, in the axis's `lengthUnit`. */
  @OptionalFinite('drive.nominalDiameter')
  nominalDiameter?: number;

  /** Screw's root diameter, in the axis's `lengthUnit`. */
  @OptionalFinite('drive.rootDiameter')
  rootDiameter?: number;

  /** Screw length between its supports, in the axis's `lengthUnit`. */
  @OptionalFinite('drive.unsupportedLength')
  unsupportedLength?: number;

  @Optional()
  @IsIn(MOUNTINGS, { message: `drive.mounting must be one of ${MOUNTINGS.join(', ')}` })
  mounting?: Mounting;

  /** The nut's d·n limit: nominal diameter in mm × rpm (mm·rpm, whatever the unit); 70 000 when absent. */
  @OptionalFinite('drive.dnLimit')
  dnLimit?: number;

  /** Belt tooth pitch, in the axis's `lengthUnit`. */
  @OptionalFinite('drive.beltPitch')
  beltPitch?: number;

  /** Teeth on the drive pulley (a count). */
  @OptionalFinite('drive.pulleyTeeth')
  pulleyTeeth?: number;

  /** Pinion module, in mm (a module is defined in mm whatever the unit). */
  @OptionalFinite('drive.pinionModule')
  pinionModule?: number;

  /** Teeth on the pinion (a count). */
  @OptionalFinite('drive.pinionTeeth')
  pinionTeeth?: number;
}

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

  @OptionalFinite('drive.lead')
  lead?: number;

  /** A single-start screw's lead given as threads per inch (lead = 1/threadsPerInch in), in place of lead. */
  @OptionalFinite('drive.threadsPerInch')
  threadsPerInch?: number;

  @OptionalFinite('drive.nominalDiameter')
  nominalDiameter?: number;

  @OptionalFinite('drive.rootDiameter')
  rootDiameter?: number;

  @OptionalFinite('drive.unsupportedLength')
  unsupportedLength?: number;

  @Optional()
  @IsIn(MOUNTINGS, { message: `drive.mounting must be one of ${MOUNTINGS.join(', ')}` })
  mounting?: Mounting;

  @OptionalFinite('drive.dnLimit')
  dnLimit?: number;

  @OptionalFinite('drive.beltPitch')
  beltPitch?: number;

  @OptionalFinite('drive.pulleyTeeth')
  pulleyTeeth?: number;

  @OptionalFinite('drive.pinionModule')
  pinionModule?: number;

  @OptionalFinite('drive.pinionTeeth')
  pinionTeeth?: number;
}

import { IsIn } from 'class-validator';
import { MOUNTINGS, type Mounting } from '../../engine/screw-speed.js';
import { FiniteNumber, OptionalFiniteNumber } from './validators.js';
import { UnitFamiliesDto } from './unit-families.dto.js';

/** Diameters, length and lead in `lengthUnit`, feed rate in `lengthUnit` per minute. */
export class ScrewSpeedDto extends UnitFamiliesDto {
  /** Screw nominal diameter, in lengthUnit. */
  @FiniteNumber('nominalDiameter')
  nominalDiameter: number;

  /** Screw root diameter, in lengthUnit. */
  @FiniteNumber('rootDiameter')
  rootDiameter: number;

  /** Length between bearings (or from the fixed end), in lengthUnit. */
  @FiniteNumber('unsupportedLength')
  unsupportedLength: number;

  /** Screw lead (travel per turn), in lengthUnit. */
  @FiniteNumber('lead')
  lead: number;

  @IsIn(MOUNTINGS, { message: `mounting must be one of ${MOUNTINGS.join(', ')}` })
  mounting: Mounting;

  /** Fastest feed, in lengthUnit per minute. */
  @FiniteNumber('feedRate')
  feedRate: number;

  /** Nominal diameter in mm × rpm limit of the nut (defined in mm whatever the unit); 70 000 (rolled screws) when absent. */
  @OptionalFiniteNumber('dnLimit')
  dnLimit?: number;
}

import { IsIn } from 'class-validator';
import { MOUNTINGS, type Mounting } from '../../engine/screw-speed.js';
import { FiniteNumber, OptionalFiniteNumber } from './validators.js';

/** Lengths in mm, feed rate in mm/min. */
export class ScrewSpeedDto {
  @FiniteNumber('nominalDiameter')
  nominalDiameter: number;

  @FiniteNumber('rootDiameter')
  rootDiameter: number;

  @FiniteNumber('unsupportedLength')
  unsupportedLength: number;

  @FiniteNumber('lead')
  lead: number;

  @IsIn(MOUNTINGS, { message: `mounting must be one of ${MOUNTINGS.join(', ')}` })
  mounting: Mounting;

  @FiniteNumber('feedRate')
  feedRate: number;

  /** Nominal diameter × rpm limit of the nut; 70 000 (rolled screws) when absent. */
  @OptionalFiniteNumber('dnLimit')
  dnLimit?: number;
}

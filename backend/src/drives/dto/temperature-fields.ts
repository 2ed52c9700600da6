import { IsIn } from 'class-validator';
import { SCALE_MATERIALS, type ScaleMaterial } from '../../engine/thermal.js';
import { Optional } from '../../common/optional.js';
import { OptionalFinite } from './validators.js';

/** What a travel trial and a repeat-and-reverse run record for referring results to 20 °C. */
export class TemperatureFieldsDto {
  /** Temperature of the machine (its screw, rack or frame), °C. */
  @OptionalFinite('machineTemperature')
  machineTemperature?: number;

  /** Temperature of the scale (tape, rule, glass scale), °C. */
  @OptionalFinite('scaleTemperature')
  scaleTemperature?: number;

  @Optional()
  @IsIn(SCALE_MATERIALS, { message: `scaleMaterial must be one of ${SCALE_MATERIALS.join(', ')}` })
  scaleMaterial?: ScaleMaterial;

  /** Smallest step the instrument reads, in readingUnit. */
  @OptionalFinite('instrumentResolution')
  instrumentResolution?: number;
}

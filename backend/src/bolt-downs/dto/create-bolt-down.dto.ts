import { IsIn, IsNumber, Max, Min } from 'class-validator';
import { BOLT_DOWN_MODES, BOLT_DOWN_UNITS, type BoltDownMode, type BoltDownUnit } from '../../database/schema/bolt-downs.js';
import { Optional } from '../../common/optional.js';

export class CreateBoltDownDto {
  /** "face": aim every hole at the first fixed reading; "line": at the line through the nearest fixed holes. */
  @IsIn(BOLT_DOWN_MODES, { message: `mode must be one of ${BOLT_DOWN_MODES.join(', ')}` })
  mode: BoltDownMode;

  /** Unit the readings are typed in; mm when absent. */
  @Optional()
  @IsIn(BOLT_DOWN_UNITS, { message: `unit must be one of ${BOLT_DOWN_UNITS.join(', ')}` })
  unit?: BoltDownUnit;

  /**
   * Half-width of the band around the aim that counts as on target, in `unit`; when absent, half
   * the rail straightness target of the machine's target set.
   */
  @Optional()
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'band must be a number in the bolt-down unit' })
  @Min(0, { message: 'band must not be negative' })
  @Max(100_000, { message: 'band is too large' })
  band?: number;
}

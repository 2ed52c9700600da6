import { IsIn, IsNumber, Max, Min } from 'class-validator';
import { BOLT_DOWN_MODES, type BoltDownMode, type BoltDownUnit } from '../../database/schema/bolt-downs.js';
import { LengthUnitField, ReadingUnitField } from '../../common/unit-fields.js';
import { ReplacedUnitField } from '../../rails/dto/replaced-unit.js';
import { Optional } from '../../common/optional.js';
import { ApiHideProperty } from '@nestjs/swagger';

export class CreateBoltDownDto {
  /** "face": aim every hole at the first fixed reading; "line": at the line through the nearest fixed holes. */
  @IsIn(BOLT_DOWN_MODES, { message: `mode must be one of ${BOLT_DOWN_MODES.join(', ')}` })
  mode: BoltDownMode;

  /** Unit the readings and the band are typed in; mm when absent. */
  @ReadingUnitField()
  readingUnit?: BoltDownUnit;

  /** Unit the hole positions are shown in; the rail's own length unit when absent. */
  @LengthUnitField()
  lengthUnit?: BoltDownUnit;

  @ReplacedUnitField()
  @ApiHideProperty() // refused when sent, so not part of the described request
  unit?: never;

  /**
   * Half-width of the band around the aim that counts as on target, in `readingUnit`; when absent, half
   * the rail straightness target of the machine's target set.
   */
  @Optional()
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'band must be a number in readingUnit' })
  @Min(0, { message: 'band must not be negative' })
  @Max(100_000, { message: 'band is too large' })
  band?: number;
}

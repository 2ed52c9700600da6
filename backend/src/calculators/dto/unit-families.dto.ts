import { ValidateIf, Equals } from 'class-validator';
import { LengthUnitField, ReadingUnitField, UNIT_FAMILY_HINT } from '../../common/unit-fields.js';
import type { LengthUnit } from '../../engine/units.js';
import { ApiHideProperty } from '@nestjs/swagger';

/**
 * The two unit families every calculator takes (both mm when absent), with the same meanings as
 * the records: `lengthUnit` for positions, geometry, commanded and measured moves, lead, pitch,
 * diameters, lengths and travel (feed rates per minute); `readingUnit` for indicator readings,
 * deviations and heights. A calculator with no readings still takes `readingUnit`, so one body
 * shape fits every route.
 */
export class UnitFamiliesDto {
  @LengthUnitField()
  lengthUnit?: LengthUnit;

  @ReadingUnitField()
  readingUnit?: LengthUnit;

  // The single `unit` of earlier requests meant different things on different routes; it is
  // refused with a message that names its replacements rather than the pipe's "should not exist".
  @ValidateIf((_: object, v: unknown) => v !== undefined)
  @Equals(undefined, {
    message: `unit is no longer accepted: send lengthUnit and readingUnit instead (${UNIT_FAMILY_HINT})`,
  })
  @ApiHideProperty() // refused when sent, so not part of the described request
  unit?: never;
}

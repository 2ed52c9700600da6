import { IsEmpty } from 'class-validator';
import { applyDecorators } from '@nestjs/common';
import { UNIT_FAMILY_HINT } from '../../common/unit-fields.js';

/** The old single `unit` field: refused with a message that names its two successors. */
export const ReplacedUnitField = () =>
  applyDecorators(
    IsEmpty({ message: `unit is no longer accepted: send lengthUnit and readingUnit instead (${UNIT_FAMILY_HINT})` }),
  );

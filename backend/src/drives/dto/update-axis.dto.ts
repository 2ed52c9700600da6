import type { Type } from '@nestjs/common';
import { PartialType } from '@nestjs/swagger'; // carries the rules and the API description
import { ValidateIf } from 'class-validator';
import { CreateAxisDto } from './create-axis.dto.js';

/** null clears a field that may be empty; absent leaves it as it is. */
const Clearable = () => ValidateIf((_: object, v: unknown) => v !== null && v !== undefined);
type Clearing = 'maxFeedRate' | 'measuredTravel' | 'measuredTravelMm';
// Typed so that the clearable fields below may be null.
const Base: Type<Partial<Omit<CreateAxisDto, Clearing>> & { [K in Clearing]?: number | null }> = PartialType(
  CreateAxisDto,
  { skipNullProperties: false },
);

/**
 * Every field of a new axis, each optional, with its rules and messages; a drive given replaces
 * the whole drive. null clears maxFeedRate, measuredTravel or measuredTravelMm (a field redeclared
 * here keeps the create DTO's number rule, its own condition replacing the inherited ones).
 */
export class UpdateAxisDto extends Base {
  /** The fastest feed rate the axis will be asked for, lengthUnit per minute; null clears it. */
  @Clearable()
  maxFeedRate?: number | null;

  /** Travel measured end to end, in lengthUnit; null clears it. */
  @Clearable()
  measuredTravel?: number | null;

  /** The same in mm whatever lengthUnit says (older callers); not together with measuredTravel. */
  @Clearable()
  measuredTravelMm?: number | null;
}

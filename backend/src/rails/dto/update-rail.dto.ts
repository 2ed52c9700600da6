import { PartialType } from '@nestjs/swagger'; // carries the rules and the API description
import { CreateRailDto } from './create-rail.dto.js';

/**
 * Every field of a new rail, each optional; partnerRailId null unpairs both rails. Absent fields
 * skip their rules, but null is checked (and refused with the field's own message) except where
 * the create DTO already takes null as "clear" (profileSize, spacing, endDistance, partnerRailId).
 */
export class UpdateRailDto extends PartialType(CreateRailDto, { skipNullProperties: false }) {}

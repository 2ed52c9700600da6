import { RailFieldsDto } from './rail-geometry.dto.js';

/** Every field optional; partnerRailId null unpairs both rails. */
export class UpdateRailDto extends RailFieldsDto {}

import { PartialType } from '@nestjs/swagger'; // carries the rules and the API description
import { CreateMachineDto } from './create-machine.dto.js';

/**
 * Every field of a new machine, each optional. Absent fields skip their rules; null is checked
 * (and refused with the field's own message). A lengthUnit alone changes the unit the work area
 * is shown in; the lengths stay as they are.
 */
export class UpdateMachineDto extends PartialType(CreateMachineDto, { skipNullProperties: false }) {}

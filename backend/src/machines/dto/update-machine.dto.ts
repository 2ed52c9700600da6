import { Type } from 'class-transformer';
import { IsIn, IsObject, IsString, IsUUID, MaxLength, MinLength, ValidateNested } from 'class-validator';
import { MACHINE_KINDS, type MachineKind } from '../../database/schema/machines.js';
import { WorkAreaDto } from './create-machine.dto.js';
import { Optional } from '../../common/optional.js';
import { LengthUnitField } from '../../common/unit-fields.js';
import type { LengthUnit } from '../../engine/units.js';

export class UpdateMachineDto {
  @Optional()
  @IsString()
  @MinLength(1, { message: 'name must not be empty' })
  @MaxLength(120)
  name?: string;

  @Optional()
  @IsIn(MACHINE_KINDS, { message: `kind must be one of ${MACHINE_KINDS.join(', ')}` })
  kind?: MachineKind;

  /** Changes the unit the work area is typed and shown in; alone, the lengths stay as they are. */
  @LengthUnitField()
  lengthUnit?: LengthUnit;

  @Optional()
  @IsObject({ message: 'workArea must be an object {x, y} in lengthUnit (the machine’s unit when absent)' })
  @ValidateNested()
  @Type(() => WorkAreaDto)
  workArea?: WorkAreaDto;

  @Optional()
  @IsString()
  @MaxLength(5000)
  notes?: string;

  @Optional()
  @IsUUID('all', { message: 'targetSetId must be the id of a target set' })
  targetSetId?: string;
}

import { Type } from 'class-transformer';
import { IsIn, IsObject, IsString, IsUUID, MaxLength, MinLength, ValidateNested } from 'class-validator';
import { MACHINE_KINDS, type MachineKind } from '../../database/schema/machines.js';
import { WorkAreaDto } from './create-machine.dto.js';
import { Optional } from '../../common/optional.js';

export class UpdateMachineDto {
  @Optional()
  @IsString()
  @MinLength(1, { message: 'name must not be empty' })
  @MaxLength(120)
  name?: string;

  @Optional()
  @IsIn(MACHINE_KINDS, { message: `kind must be one of ${MACHINE_KINDS.join(', ')}` })
  kind?: MachineKind;

  @Optional()
  @IsObject({ message: 'workArea must be an object {x, y} in mm' })
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

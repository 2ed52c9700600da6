import { Type } from 'class-transformer';
import { IsIn, IsObject, IsOptional, IsString, IsUUID, MaxLength, MinLength, ValidateNested } from 'class-validator';
import { MACHINE_KINDS, type MachineKind } from '../../database/schema/machines.js';
import { WorkAreaDto } from './create-machine.dto.js';

export class UpdateMachineDto {
  @IsOptional()
  @IsString()
  @MinLength(1, { message: 'name must not be empty' })
  @MaxLength(120)
  name?: string;

  @IsOptional()
  @IsIn(MACHINE_KINDS, { message: `kind must be one of ${MACHINE_KINDS.join(', ')}` })
  kind?: MachineKind;

  @IsOptional()
  @IsObject({ message: 'workArea must be an object {x, y} in mm' })
  @ValidateNested()
  @Type(() => WorkAreaDto)
  workArea?: WorkAreaDto;

  @IsOptional()
  @IsString()
  @MaxLength(5000)
  notes?: string;

  @IsOptional()
  @IsUUID('all', { message: 'targetSetId must be the id of a target set' })
  targetSetId?: string;
}

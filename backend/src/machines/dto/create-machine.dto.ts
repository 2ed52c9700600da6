import { Type } from 'class-transformer';
import { IsIn, IsNumber, IsObject, IsString, IsUUID, Max, MaxLength, Min, MinLength, ValidateNested } from 'class-validator';
import { MACHINE_KINDS, type MachineKind } from '../../database/schema/machines.js';
import { Optional } from '../../common/optional.js';

export class WorkAreaDto {
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'workArea.x must be a number of mm' })
  @Min(1, { message: 'workArea.x must be at least 1 mm' })
  @Max(100_000, { message: 'workArea.x must be at most 100 000 mm' })
  x: number;

  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'workArea.y must be a number of mm' })
  @Min(1, { message: 'workArea.y must be at least 1 mm' })
  @Max(100_000, { message: 'workArea.y must be at most 100 000 mm' })
  y: number;
}

export class CreateMachineDto {
  @IsString()
  @MinLength(1, { message: 'name is required' })
  @MaxLength(120)
  name: string;

  @IsIn(MACHINE_KINDS, { message: `kind must be one of ${MACHINE_KINDS.join(', ')}` })
  kind: MachineKind;

  @IsObject({ message: 'workArea must be an object {x, y} in mm' })
  @ValidateNested()
  @Type(() => WorkAreaDto)
  workArea: WorkAreaDto;

  @Optional()
  @IsString()
  @MaxLength(5000)
  notes?: string;

  @Optional()
  @IsUUID('all', { message: 'targetSetId must be the id of a target set' })
  targetSetId?: string;
}

import { Type } from 'class-transformer';
import {
  IsIn,
  IsNumber,
  IsObject,
  IsPositive,
  IsString,
  IsUUID,
  Max,
  MaxLength,
  MinLength,
  ValidateNested,
} from 'class-validator';
import { LengthUnitField } from '../../common/unit-fields.js';
import type { LengthUnit } from '../../engine/units.js';
import { MACHINE_KINDS, type MachineKind } from '../../database/schema/machines.js';
import { Optional } from '../../common/optional.js';

/** In the request's lengthUnit; the 1 mm to 100 m range is checked once converted (MachinesService). */
export class WorkAreaDto {
  /** Usable area along X, in `lengthUnit`. */
  @IsNumber(
    { allowNaN: false, allowInfinity: false },
    { message: 'workArea.x must be a number in lengthUnit (mm when absent)' },
  )
  @IsPositive({ message: 'workArea.x must be greater than zero' })
  @Max(100_000_000, { message: 'workArea.x is too large' })
  x: number;

  /** Usable area along Y, in `lengthUnit`. */
  @IsNumber(
    { allowNaN: false, allowInfinity: false },
    { message: 'workArea.y must be a number in lengthUnit (mm when absent)' },
  )
  @IsPositive({ message: 'workArea.y must be greater than zero' })
  @Max(100_000_000, { message: 'workArea.y is too large' })
  y: number;
}

export class CreateMachineDto {
  @IsString()
  @MinLength(1, { message: 'name is required' })
  @MaxLength(120)
  name: string;

  @IsIn(MACHINE_KINDS, { message: `kind must be one of ${MACHINE_KINDS.join(', ')}` })
  kind: MachineKind;

  /** Unit of the work area as typed and shown; the lengths are kept in mm. */
  @LengthUnitField()
  lengthUnit?: LengthUnit;

  @IsObject({ message: 'workArea must be an object {x, y} in lengthUnit' })
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

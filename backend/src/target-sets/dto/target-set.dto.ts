import { ApiExtraModels, ApiProperty, ApiPropertyOptional, getSchemaPath } from '@nestjs/swagger';
import { IsObject, IsString, MaxLength, MinLength } from 'class-validator';
import type { StraightnessReference, TargetValue } from '../../database/schema/target-sets.js';
import { Optional } from '../../common/optional.js';

/**
 * One target as sent, under its key in `targets`. Checked in the service (which names the key of a
 * bad entry), so it carries no validation rules of its own.
 */
export class TargetValueDto {
  /** 0 or more, in `unit`. */
  value: number;
  /** A length unit for a length target; mm/m, %, days or um/mm as the target's key needs. */
  unit: TargetValue['unit'];
  /** Where the value comes from, at most 500 characters. */
  source?: string;
  /** The line straightness is judged from; read on railStraightness only. */
  reference?: StraightnessReference;
}

// The values inside `targets` by name, so the browser types them.
const TARGETS_BY_KEY = { type: 'object', additionalProperties: { $ref: getSchemaPath(TargetValueDto) } } as const;

@ApiExtraModels(TargetValueDto)
export class CreateTargetSetDto {
  @IsString()
  @MinLength(1, { message: 'name is required' })
  @MaxLength(120)
  name: string;

  @Optional()
  @IsString()
  @MaxLength(2000)
  description?: string;

  /** Keyed by target name; checked one by one in the service, which names any bad entry. */
  @IsObject({ message: 'targets must be an object keyed by target name' })
  @ApiProperty(TARGETS_BY_KEY)
  targets: Record<string, Partial<TargetValue>>;
}

@ApiExtraModels(TargetValueDto)
export class UpdateTargetSetDto {
  @Optional()
  @IsString()
  @MinLength(1, { message: 'name must not be empty' })
  @MaxLength(120)
  name?: string;

  @Optional()
  @IsString()
  @MaxLength(2000)
  description?: string;

  @Optional()
  @IsObject({ message: 'targets must be an object keyed by target name' })
  @ApiPropertyOptional(TARGETS_BY_KEY)
  targets?: Record<string, Partial<TargetValue>>;
}

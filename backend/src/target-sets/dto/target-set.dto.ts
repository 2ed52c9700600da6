import { IsObject, IsString, MaxLength, MinLength } from 'class-validator';
import type { TargetValue } from '../../database/schema/target-sets.js';
import { Optional } from '../../common/optional.js';

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
  targets: Record<string, Partial<TargetValue>>;
}

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
  targets?: Record<string, Partial<TargetValue>>;
}

import { IsString, IsUUID, MinLength } from 'class-validator';
import { Optional } from '../../common/optional.js';

/** Either one subject (subjectType + subjectId) or a whole machine (machineId). */
export class ListEvidenceQueryDto {
  @Optional()
  @IsString({ message: 'subjectType must be text, for example machine or rail-sweep' })
  @MinLength(1, { message: 'subjectType must not be empty' })
  subjectType?: string;

  @Optional()
  @IsUUID('all', { message: 'subjectId must be the id (a uuid) of a record' })
  subjectId?: string;

  @Optional()
  @IsUUID('all', { message: 'machineId must be the id (a uuid) of a machine' })
  machineId?: string;
}

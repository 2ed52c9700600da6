import { IsString, IsUUID, MaxLength, MinLength } from 'class-validator';
import { Optional } from '../../common/optional.js';
import { ShowableText } from '../../common/showable-text.js';

/** The text fields sent beside the file in a multipart upload. */
export class UploadFieldsDto {
  @IsString({ message: 'subjectType must be text, for example machine or rail-sweep' })
  @MinLength(1, { message: 'subjectType is required: what the file is attached to (machine, rail, rail-sweep…)' })
  @ShowableText('subjectType')
  subjectType: string;

  @IsUUID('all', { message: 'subjectId must be the id (a uuid) of the record the file is attached to' })
  subjectId: string;

  @Optional()
  @IsString({ message: 'caption must be text' })
  @MaxLength(500, { message: 'caption must be at most 500 characters' })
  @ShowableText('caption')
  caption?: string;
}

import { IsIn, IsString, MaxLength } from 'class-validator';
import { SAFETY_ANSWERS, type SafetyAnswer } from '../../database/schema/safety.js';
import { Optional } from '../../common/optional.js';

export class AnswerItemDto {
  @IsIn(SAFETY_ANSWERS, { message: 'answer must be one of yes, no, na' })
  answer: SafetyAnswer;

  @Optional()
  @IsString({ message: 'note must be text' })
  @MaxLength(2000, { message: 'note must be at most 2000 characters' })
  note?: string;
}

import { IsIn, IsString, MaxLength, MinLength } from 'class-validator';
import { SAFETY_SECTIONS, type SafetySection } from '../../database/schema/safety.js';

export class CreateSafetyItemDto {
  @IsIn(SAFETY_SECTIONS, { message: `section must be one of ${SAFETY_SECTIONS.join(', ')}` })
  section: SafetySection;

  @IsString({ message: 'text must be text' })
  @MinLength(5, { message: 'text must say what is checked (at least 5 characters)' })
  @MaxLength(400, { message: 'text must be at most 400 characters' })
  text: string;
}

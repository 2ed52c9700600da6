import { IsIn } from 'class-validator';
import { Optional } from '../../common/optional.js';
import { PAPERS, type PaperKey } from '../template/sheet-layout.js';

const KEYS = Object.keys(PAPERS) as PaperKey[];

export class TemplateQueryDto {
  @Optional()
  @IsIn(KEYS, { message: `paper must be one of ${KEYS.join(', ')}` })
  paper?: PaperKey;
}

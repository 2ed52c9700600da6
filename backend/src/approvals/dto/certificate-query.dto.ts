import { IsUUID } from 'class-validator';
import { Optional } from '../../common/optional.js';

export class CertificateQueryDto {
  @Optional()
  @IsUUID('all', { message: 'approval must be the id of one of this machine\u2019s approvals' })
  approval?: string;
}

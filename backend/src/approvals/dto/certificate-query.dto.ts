import { IsOptional, IsUUID } from 'class-validator';

export class CertificateQueryDto {
  @IsOptional()
  @IsUUID('all', { message: 'approval must be the id of one of this machine\u2019s approvals' })
  approval?: string;
}

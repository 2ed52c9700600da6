import { Body, Controller, Get, Param, ParseUUIDPipe, Post, Query, Res } from '@nestjs/common';
import type { FastifyReply } from 'fastify';
import { CurrentUser, Roles } from '../auth/decorators.js';
import type { SessionUser } from '../auth/session-user.js';
import { ApprovalsService } from './approvals.service.js';
import { CertificateService } from './certificate/certificate.service.js';
import { DriftService } from './drift.service.js';
import { ApproveDto } from './dto/approve.dto.js';
import { CertificateQueryDto } from './dto/certificate-query.dto.js';
import { WaiverDto } from './dto/waiver.dto.js';
import { ReopenDto } from './dto/reopen.dto.js';
import { create as contentDisposition } from 'content-disposition';
import { ApiProduces } from '@nestjs/swagger';
import { ConflictsWhen } from '../openapi/error-responses.js';

@Controller('machines/:id')
export class ApprovalsController {
  constructor(
    private readonly approvals: ApprovalsService,
    private readonly certificates: CertificateService,
    private readonly drift: DriftService,
  ) {}

  @Get('readiness')
  readiness(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string) {
    return this.approvals.readiness(user, id);
  }

  @Post('checks/:checkId/waiver')
  @Roles('owner')
  @ConflictsWhen('approval-lock', 'state')
  waive(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) id: string,
    @Param('checkId') checkId: string,
    @Body() dto: WaiverDto,
  ) {
    return this.approvals.waive(user, id, checkId, dto);
  }

  @Post('approval-requests')
  @Roles('technician', 'owner', 'admin')
  @ConflictsWhen('state')
  requestApproval(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string) {
    return this.approvals.requestApproval(user, id);
  }

  @Post('approvals')
  @Roles('owner')
  @ConflictsWhen('state')
  approve(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string, @Body() dto: ApproveDto) {
    return this.approvals.approve(user, id, dto);
  }

  @Post('reopen')
  @Roles('owner')
  @ConflictsWhen('state')
  reopen(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string, @Body() dto: ReopenDto) {
    return this.approvals.reopen(user, id, dto);
  }

  @Get('approvals')
  list(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string) {
    return this.certificates.list(user, id);
  }

  @Get('approvals/:approvalId/verification')
  verify(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) id: string,
    @Param('approvalId', ParseUUIDPipe) approvalId: string,
  ) {
    return this.certificates.verify(user, id, approvalId);
  }

  @Get('drift')
  driftOf(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string) {
    return this.drift.compare(user, id);
  }

  @Get('certificate.pdf')
  @ApiProduces('application/pdf')
  async certificate(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) id: string,
    @Query() query: CertificateQueryDto,
    @Res({ passthrough: true }) reply: FastifyReply,
  ) {
    const { pdf, filename } = await this.certificates.forMachine(user, id, query.approval);
    reply.header('Content-Type', 'application/pdf');
    reply.header('Content-Disposition', contentDisposition(filename));
    reply.header('Cache-Control', 'private, no-store');
    return pdf;
  }
}

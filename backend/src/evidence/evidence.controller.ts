import { Controller, Delete, Get, HttpCode, Param, ParseUUIDPipe, Post, Query, Req, Res } from '@nestjs/common';
import type { FastifyReply, FastifyRequest } from 'fastify';
import { CurrentUser, RECORDERS, Roles } from '../auth/decorators.js';
import type { SessionUser } from '../auth/session-user.js';
import { ListEvidenceQueryDto } from './dto/list-evidence.query.js';
import { EvidenceUploadService } from './evidence-upload.service.js';
import { EvidenceService, type Download } from './evidence.service.js';
import { ApiBody, ApiConsumes, ApiExtraModels, ApiProduces, getSchemaPath } from '@nestjs/swagger';
import { UploadFieldsDto } from './dto/upload-fields.dto.js';
import { ConflictsWhen } from '../openapi/error-responses.js';

@Controller('evidence')
export class EvidenceController {
  constructor(
    private readonly evidence: EvidenceService,
    private readonly uploads: EvidenceUploadService,
  ) {}

  /** multipart/form-data: file, subjectType, subjectId, caption (optional). */
  @Post()
  @ApiConsumes('multipart/form-data')
  @ApiExtraModels(UploadFieldsDto)
  @ApiBody({
    required: true,
    schema: {
      allOf: [
        { $ref: getSchemaPath(UploadFieldsDto) },
        {
          type: 'object',
          required: ['file'],
          properties: { file: { type: 'string', format: 'binary', description: 'The photo or file (one a request).' } },
        },
      ],
    },
  })
  @Roles(...RECORDERS)
  upload(@CurrentUser() user: SessionUser, @Req() req: FastifyRequest) {
    return this.uploads.upload(user, req);
  }

  @Get()
  list(@CurrentUser() user: SessionUser, @Query() query: ListEvidenceQueryDto) {
    return this.evidence.list(user, query);
  }

  @Get('limits')
  limits() {
    return this.evidence.limits();
  }

  @Get(':id')
  get(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string) {
    return this.evidence.get(user, id);
  }

  @Get(':id/content')
  @ApiProduces('image/jpeg', 'image/png', 'image/webp', 'application/pdf', 'text/csv')
  async content(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) id: string,
    @Res({ passthrough: true }) reply: FastifyReply,
  ) {
    return send(reply, await this.evidence.content(user, id));
  }

  @Get(':id/thumbnail')
  @ApiProduces('image/webp')
  async thumbnail(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) id: string,
    @Res({ passthrough: true }) reply: FastifyReply,
  ) {
    return send(reply, await this.evidence.thumbnail(user, id));
  }

  @Delete(':id')
  @Roles(...RECORDERS)
  @HttpCode(204)
  @ConflictsWhen('approval-lock')
  remove(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string) {
    return this.evidence.remove(user, id);
  }
}

function send(reply: FastifyReply, download: Download) {
  reply.headers(download.headers);
  return download.file;
}

import { Body, Controller, Delete, Get, HttpCode, Param, ParseUUIDPipe, Post, Put, Query, Res } from '@nestjs/common';
import type { FastifyReply } from 'fastify';
import { CurrentUser, RECORDERS, Roles } from '../auth/decorators.js';
import type { SessionUser } from '../auth/session-user.js';
import { HolePatternDto } from './dto/hole-pattern.dto.js';
import { TemplateQueryDto } from './dto/template-query.dto.js';
import { HolePatternsService } from './hole-patterns.service.js';
import { TemplatesService, type TemplateFile } from './templates.service.js';
import { create as contentDisposition } from 'content-disposition';
import { ApiProduces } from '@nestjs/swagger';

@Controller()
export class HolePatternsController {
  constructor(
    private readonly patterns: HolePatternsService,
    private readonly templates: TemplatesService,
  ) {}

  @Get('machines/:id/hole-patterns')
  list(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) machineId: string) {
    return this.patterns.list(user, machineId);
  }

  @Post('machines/:id/hole-patterns')
  @Roles(...RECORDERS)
  create(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) machineId: string, @Body() dto: HolePatternDto) {
    return this.patterns.create(user, machineId, dto);
  }

  @Post('hole-patterns/preview')
  @Roles(...RECORDERS)
  @HttpCode(200)
  preview(@Body() dto: HolePatternDto) {
    return this.patterns.preview(dto);
  }

  @Get('hole-patterns/:id')
  get(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string) {
    return this.patterns.get(user, id);
  }

  @Put('hole-patterns/:id')
  @Roles(...RECORDERS)
  update(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string, @Body() dto: HolePatternDto) {
    return this.patterns.update(user, id, dto);
  }

  @Delete('hole-patterns/:id')
  @Roles(...RECORDERS)
  @HttpCode(204)
  remove(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string) {
    return this.patterns.remove(user, id);
  }

  @Get('hole-patterns/:id/template.pdf')
  @ApiProduces('application/pdf')
  async patternPdf(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) id: string,
    @Query() q: TemplateQueryDto,
    @Res({ passthrough: true }) reply: FastifyReply,
  ) {
    return send(reply, await this.templates.forPattern(user, id, 'pdf', q.paper));
  }

  @Get('hole-patterns/:id/template.svg')
  @ApiProduces('image/svg+xml')
  async patternSvg(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) id: string,
    @Res({ passthrough: true }) reply: FastifyReply,
  ) {
    return send(reply, await this.templates.forPattern(user, id, 'svg'));
  }

  @Get('rails/:id/template.pdf')
  @ApiProduces('application/pdf')
  async railPdf(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) id: string,
    @Query() q: TemplateQueryDto,
    @Res({ passthrough: true }) reply: FastifyReply,
  ) {
    return send(reply, await this.templates.forRail(user, id, 'pdf', q.paper));
  }

  @Get('rails/:id/template.svg')
  @ApiProduces('image/svg+xml')
  async railSvg(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) id: string,
    @Res({ passthrough: true }) reply: FastifyReply,
  ) {
    return send(reply, await this.templates.forRail(user, id, 'svg'));
  }
}

/** Inline, so the link opens the browser's viewer to print from; the name is kept for saving. */
function send(reply: FastifyReply, file: TemplateFile) {
  reply.header('Content-Type', file.contentType);
  reply.header('Content-Disposition', contentDisposition(file.filename, { type: 'inline' }));
  return file.body;
}

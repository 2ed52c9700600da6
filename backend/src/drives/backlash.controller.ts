import { Body, Controller, Delete, Get, HttpCode, Param, ParseUUIDPipe, Post, Query, Res } from '@nestjs/common';
import type { FastifyReply } from 'fastify';
import { CurrentUser, Roles } from '../auth/decorators.js';
import type { SessionUser } from '../auth/session-user.js';
import { NEXT_CURSOR_HEADER } from '../records/page-cursor.js';
import { PageQuery } from '../records/page.query.js';
import { BacklashService } from './backlash.service.js';
import { CALIBRATORS } from './drive-roles.js';
import { CreateBacklashCheckDto } from './dto/backlash.dto.js';
import { ConflictsWhen } from '../openapi/error-responses.js';

/** Backlash checks of one axis. */
@Controller('axes/:id/backlash-checks')
export class BacklashController {
  constructor(private readonly backlash: BacklashService) {}

  /** Newest first, a page at a time: the next page's cursor comes in the X-Next-Cursor header. */
  @Get()
  async list(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) axisId: string,
    @Query() query: PageQuery,
    @Res({ passthrough: true }) reply: FastifyReply,
  ) {
    const { items, nextCursor } = await this.backlash.list(user, axisId, query);
    if (nextCursor) reply.header(NEXT_CURSOR_HEADER, nextCursor);
    return items;
  }

  @Post()
  @Roles(...CALIBRATORS)
  @ConflictsWhen('approval-lock')
  create(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) axisId: string,
    @Body() dto: CreateBacklashCheckDto,
  ) {
    return this.backlash.create(user, axisId, dto);
  }

  @Get(':checkId')
  get(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) axisId: string,
    @Param('checkId', ParseUUIDPipe) id: string,
  ) {
    return this.backlash.get(user, axisId, id);
  }

  @Delete(':checkId')
  @Roles(...CALIBRATORS)
  @HttpCode(204)
  @ConflictsWhen('approval-lock')
  delete(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) axisId: string,
    @Param('checkId', ParseUUIDPipe) id: string,
  ) {
    return this.backlash.delete(user, axisId, id);
  }
}

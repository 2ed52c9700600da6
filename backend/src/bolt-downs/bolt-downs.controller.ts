import { Body, Controller, Get, HttpCode, Param, ParseUUIDPipe, Post, Put, Res } from '@nestjs/common';
import { ApiResponse } from '@nestjs/swagger';
import type { FastifyReply } from 'fastify';
import { CurrentUser, RECORDERS, Roles } from '../auth/decorators.js';
import type { SessionUser } from '../auth/session-user.js';
import { BoltDownsService } from './bolt-downs.service.js';
import { AbandonBoltDownDto } from './dto/abandon-bolt-down.dto.js';
import { CreateBoltDownDto } from './dto/create-bolt-down.dto.js';
import { FinalSweepDto } from './dto/final-sweep.dto.js';
import { RecordHoleDto } from './dto/record-hole.dto.js';
import { ConflictsWhen, NEW_OR_REPEATED } from '../openapi/error-responses.js';

@Controller()
export class BoltDownsController {
  constructor(private readonly boltDowns: BoltDownsService) {}

  @Post('rails/:id/bolt-downs')
  @Roles(...RECORDERS)
  @ConflictsWhen('approval-lock')
  start(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) railId: string, @Body() dto: CreateBoltDownDto) {
    return this.boltDowns.start(user, railId, dto);
  }

  /** Latest first. */
  @Get('rails/:id/bolt-downs')
  list(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) railId: string) {
    return this.boltDowns.listForRail(user, railId);
  }

  @Get('bolt-downs/:id')
  get(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string) {
    return this.boltDowns.get(user, id);
  }

  @Put('bolt-downs/:id/holes/:index')
  @Roles(...RECORDERS)
  @ConflictsWhen('approval-lock', 'reused-id', 'state')
  recordHole(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) id: string,
    @Param('index') index: string,
    @Body() dto: RecordHoleDto,
  ) {
    return this.boltDowns.recordHole(user, id, index, dto);
  }

  /** Gives the bolt-down up with a reason; a new one of the rail can then begin. */
  @Post('bolt-downs/:id/abandon')
  @Roles(...RECORDERS)
  @HttpCode(200)
  @ConflictsWhen('approval-lock', 'state')
  abandon(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string, @Body() dto: AbandonBoltDownDto) {
    return this.boltDowns.abandon(user, id, dto);
  }

  /** 201 with the new sweep; 200 with the same one when its id was seen before. */
  @Post('bolt-downs/:id/final-sweep')
  @Roles(...RECORDERS)
  @ApiResponse({ status: 201, description: NEW_OR_REPEATED.created('final sweep') })
  @ApiResponse({ status: 200, description: NEW_OR_REPEATED.repeated('final sweep') })
  @ConflictsWhen('approval-lock', 'reused-id', 'state')
  async finalSweep(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) id: string,
    @Body() dto: FinalSweepDto,
    @Res({ passthrough: true }) reply: FastifyReply,
  ) {
    const { created, boltDown, sweep } = await this.boltDowns.recordFinalSweep(user, id, dto);
    reply.status(created ? 201 : 200);
    return { boltDown, sweep };
  }
}

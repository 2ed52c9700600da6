import { Body, Controller, Delete, Get, HttpCode, Param, ParseUUIDPipe, Patch, Post, Query, Res } from '@nestjs/common';
import { ApiResponse } from '@nestjs/swagger';
import type { FastifyReply } from 'fastify';
import { CurrentUser, RECORDERS, Roles } from '../auth/decorators.js';
import type { SessionUser } from '../auth/session-user.js';
import { boltTorqueTable } from './bolt-torques.js';
import { CreateRailDto } from './dto/create-rail.dto.js';
import { CreateSweepDto } from './dto/create-sweep.dto.js';
import { PageQuery } from '../records/page.query.js';
import { NEXT_CURSOR_HEADER } from '../records/page-cursor.js';
import { UpdateRailDto } from './dto/update-rail.dto.js';
import { UpdateSweepDetailsDto } from './dto/update-sweep-details.dto.js';
import { RailChecksService } from './rail-checks.service.js';
import { RailSweepsService } from './rail-sweeps.service.js';
import { RailsService } from './rails.service.js';
import { ConflictsWhen, NEW_OR_REPEATED } from '../openapi/error-responses.js';

@Controller()
export class RailsController {
  constructor(
    private readonly rails: RailsService,
    private readonly sweeps: RailSweepsService,
    private readonly checks: RailChecksService,
  ) {}

  @Get('rails/bolt-torques')
  boltTorques() {
    return boltTorqueTable();
  }

  @Get('machines/:id/rails')
  list(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) machineId: string) {
    return this.rails.list(user, machineId);
  }

  @Post('machines/:id/rails')
  @Roles(...RECORDERS)
  @ConflictsWhen('approval-lock')
  create(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) machineId: string, @Body() dto: CreateRailDto) {
    return this.rails.create(user, machineId, dto);
  }

  @Get('rails/:id')
  get(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string) {
    return this.rails.get(user, id);
  }

  @Patch('rails/:id')
  @Roles(...RECORDERS)
  @ConflictsWhen('approval-lock')
  update(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string, @Body() dto: UpdateRailDto) {
    return this.rails.update(user, id, dto);
  }

  @Delete('rails/:id')
  @Roles(...RECORDERS)
  @HttpCode(204)
  @ConflictsWhen('approval-lock')
  remove(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string) {
    return this.rails.remove(user, id);
  }

  @Get('rails/:id/parallelism')
  parallelism(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string) {
    return this.checks.parallelismOf(user, id);
  }

  /** Newest first, summaries only, a page at a time: the next page's cursor comes in the X-Next-Cursor header. */
  @Get('rails/:id/sweeps')
  async listSweeps(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) id: string,
    @Query() query: PageQuery,
    @Res({ passthrough: true }) reply: FastifyReply,
  ) {
    const { items, nextCursor } = await this.sweeps.list(user, id, query);
    if (nextCursor) reply.header(NEXT_CURSOR_HEADER, nextCursor);
    return items;
  }

  /** 201 for a new sweep; 200 with the same sweep when the client id was seen before. */
  @Post('rails/:id/sweeps')
  @Roles(...RECORDERS)
  @ApiResponse({ status: 201, description: NEW_OR_REPEATED.created('sweep') })
  @ApiResponse({ status: 200, description: NEW_OR_REPEATED.repeated('sweep') })
  @ConflictsWhen('approval-lock', 'reused-id')
  async recordSweep(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) id: string,
    @Body() dto: CreateSweepDto,
    @Res({ passthrough: true }) reply: FastifyReply,
  ) {
    const { created, sweep } = await this.sweeps.record(user, id, dto);
    reply.status(created ? 201 : 200);
    return sweep;
  }

  @Get('sweeps/:id')
  getSweep(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string) {
    return this.sweeps.get(user, id);
  }

  /** Corrects a sweep's details (not its readings) while no approval stands on it. */
  @Patch('sweeps/:id')
  @Roles(...RECORDERS)
  @ConflictsWhen('approval-lock')
  updateSweep(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) id: string,
    @Body() dto: UpdateSweepDetailsDto,
  ) {
    return this.sweeps.updateDetails(user, id, dto);
  }

  @Delete('sweeps/:id')
  @Roles(...RECORDERS)
  @HttpCode(204)
  @ConflictsWhen('approval-lock')
  removeSweep(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string) {
    return this.sweeps.remove(user, id);
  }
}

import { Body, Controller, Delete, Get, HttpCode, Param, ParseUUIDPipe, Post, Query, Res } from '@nestjs/common';
import type { FastifyReply } from 'fastify';
import { CurrentUser, Roles } from '../auth/decorators.js';
import type { SessionUser } from '../auth/session-user.js';
import { CALIBRATORS } from './drive-roles.js';
import { PageQuery } from '../records/page.query.js';
import { NEXT_CURSOR_HEADER } from '../records/page-cursor.js';
import { CreatePositioningRunDto } from './dto/positioning-run.dto.js';
import { TestProgramQuery, TestTargetsQuery } from './dto/test-program.query.js';
import { ApplyTravelTrialDto, CreateTravelTrialDto } from './dto/travel-trial.dto.js';
import { PositioningRunsService } from './positioning-runs.service.js';
import { TestProgramService } from './test-program.service.js';
import { TravelTrialsService } from './travel-trials.service.js';
import { create as contentDisposition } from 'content-disposition';
import { ApiProduces } from '@nestjs/swagger';
import { ConflictsWhen, UnprocessableWhen } from '../openapi/error-responses.js';

/** Travel trials, repeat-and-reverse runs and test programs of one axis. */
@Controller('axes/:id')
export class AxisChecksController {
  constructor(
    private readonly trials: TravelTrialsService,
    private readonly runs: PositioningRunsService,
    private readonly programs: TestProgramService,
  ) {}

  /** Newest first, without moves, a page at a time: the next page's cursor comes in the X-Next-Cursor header. */
  @Get('travel-trials')
  async listTrials(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) axisId: string,
    @Query() query: PageQuery,
    @Res({ passthrough: true }) reply: FastifyReply,
  ) {
    const { items, nextCursor } = await this.trials.list(user, axisId, query);
    if (nextCursor) reply.header(NEXT_CURSOR_HEADER, nextCursor);
    return items;
  }

  @Post('travel-trials')
  @Roles(...CALIBRATORS)
  @ConflictsWhen('approval-lock')
  createTrial(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) axisId: string,
    @Body() dto: CreateTravelTrialDto,
  ) {
    return this.trials.create(user, axisId, dto);
  }

  @Get('travel-trials/:trialId')
  getTrial(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) axisId: string,
    @Param('trialId', ParseUUIDPipe) id: string,
  ) {
    return this.trials.get(user, axisId, id);
  }

  @Post('travel-trials/:trialId/apply')
  @Roles(...CALIBRATORS)
  @HttpCode(200)
  @ConflictsWhen('approval-lock', 'state')
  @UnprocessableWhen(
    "The corrected steps per mm is far from the drive's theoretical value and `confirmFarCorrection` was not sent as true.",
  )
  apply(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) axisId: string,
    @Param('trialId', ParseUUIDPipe) id: string,
    @Body() dto: ApplyTravelTrialDto,
  ) {
    return this.trials.apply(user, axisId, id, dto ?? {});
  }

  @Delete('travel-trials/:trialId')
  @Roles(...CALIBRATORS)
  @HttpCode(204)
  @ConflictsWhen('approval-lock')
  deleteTrial(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) axisId: string,
    @Param('trialId', ParseUUIDPipe) id: string,
  ) {
    return this.trials.delete(user, axisId, id);
  }

  /** Newest first, without deviations, a page at a time, as the trials. */
  @Get('positioning-runs')
  async listRuns(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) axisId: string,
    @Query() query: PageQuery,
    @Res({ passthrough: true }) reply: FastifyReply,
  ) {
    const { items, nextCursor } = await this.runs.list(user, axisId, query);
    if (nextCursor) reply.header(NEXT_CURSOR_HEADER, nextCursor);
    return items;
  }

  @Post('positioning-runs')
  @Roles(...CALIBRATORS)
  @ConflictsWhen('approval-lock')
  createRun(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) axisId: string,
    @Body() dto: CreatePositioningRunDto,
  ) {
    return this.runs.create(user, axisId, dto);
  }

  @Get('positioning-runs/:runId')
  getRun(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) axisId: string,
    @Param('runId', ParseUUIDPipe) id: string,
  ) {
    return this.runs.get(user, axisId, id);
  }

  @Delete('positioning-runs/:runId')
  @Roles(...CALIBRATORS)
  @HttpCode(204)
  @ConflictsWhen('approval-lock')
  deleteRun(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) axisId: string,
    @Param('runId', ParseUUIDPipe) id: string,
  ) {
    return this.runs.delete(user, axisId, id);
  }

  /** The default targets of the repeat-and-reverse program, for the entry grid to use the same list. */
  @Get('test-targets')
  testTargets(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) axisId: string,
    @Query() q: TestTargetsQuery,
  ) {
    return this.programs.targets(user, axisId, q);
  }

  @Get('test-program')
  @ApiProduces('text/plain')
  async testProgram(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) axisId: string,
    @Query() q: TestProgramQuery,
    @Res({ passthrough: true }) reply: FastifyReply,
  ) {
    const { filename, text } = await this.programs.program(user, axisId, q);
    reply.header('Content-Type', 'text/plain; charset=utf-8');
    reply.header('Content-Disposition', contentDisposition(filename));
    return text;
  }
}

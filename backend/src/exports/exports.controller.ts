import { Controller, Get, Param, ParseUUIDPipe, Res } from '@nestjs/common';
import type { FastifyReply } from 'fastify';
import { create as contentDisposition } from 'content-disposition';
import { CurrentUser } from '../auth/decorators.js';
import type { SessionUser } from '../auth/session-user.js';
import { ExportsService, type CsvDownload } from './exports.service.js';
import { ApiProduces } from '@nestjs/swagger';

function send(reply: FastifyReply, file: CsvDownload) {
  reply.header('Content-Type', 'text/csv; charset=utf-8');
  reply.header('Content-Disposition', contentDisposition(file.filename));
  return file.content;
}

/** CSV files of a machine's measurements, for a spreadsheet: every role that reads may download. */
@Controller()
export class ExportsController {
  constructor(private readonly exports: ExportsService) {}

  @Get('rails/:id/sweeps.csv')
  @ApiProduces('text/csv')
  async sweeps(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) id: string,
    @Res({ passthrough: true }) reply: FastifyReply,
  ) {
    return send(reply, await this.exports.sweeps(user, id));
  }

  @Get('axes/:id/travel-trials.csv')
  @ApiProduces('text/csv')
  async travelTrials(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) id: string,
    @Res({ passthrough: true }) reply: FastifyReply,
  ) {
    return send(reply, await this.exports.travelTrials(user, id));
  }

  @Get('axes/:id/positioning-runs.csv')
  @ApiProduces('text/csv')
  async positioningRuns(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) id: string,
    @Res({ passthrough: true }) reply: FastifyReply,
  ) {
    return send(reply, await this.exports.positioningRuns(user, id));
  }

  @Get('machines/:id/bed-grids.csv')
  @ApiProduces('text/csv')
  async bedGrids(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) id: string,
    @Res({ passthrough: true }) reply: FastifyReply,
  ) {
    return send(reply, await this.exports.bedGrids(user, id));
  }
}

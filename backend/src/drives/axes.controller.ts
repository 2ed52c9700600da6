import { Body, Controller, Delete, Get, HttpCode, Param, ParseUUIDPipe, Patch, Post } from '@nestjs/common';
import { CurrentUser, Roles } from '../auth/decorators.js';
import type { SessionUser } from '../auth/session-user.js';
import { AxesService } from './axes.service.js';
import { DriveChecksService } from './drive-checks.service.js';
import { CALIBRATORS } from './drive-roles.js';
import { CreateAxisDto } from './dto/create-axis.dto.js';
import { UpdateAxisDto } from './dto/update-axis.dto.js';
import { ConflictsWhen } from '../openapi/error-responses.js';

@Controller()
export class AxesController {
  constructor(
    private readonly axes: AxesService,
    private readonly checks: DriveChecksService,
  ) {}

  @Get('machines/:id/axes')
  list(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) machineId: string) {
    return this.checks.listWithChecks(user, machineId);
  }

  @Post('machines/:id/axes')
  @Roles(...CALIBRATORS)
  @ConflictsWhen('approval-lock', 'taken')
  create(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) machineId: string, @Body() dto: CreateAxisDto) {
    return this.axes.create(user, machineId, dto);
  }

  @Get('machines/:id/travel-envelope')
  travelEnvelope(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) machineId: string) {
    return this.checks.travelEnvelope(user, machineId);
  }

  @Get('axes/:id')
  get(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string) {
    return this.axes.get(user, id);
  }

  @Patch('axes/:id')
  @Roles(...CALIBRATORS)
  @ConflictsWhen('approval-lock', 'taken')
  update(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string, @Body() dto: UpdateAxisDto) {
    return this.axes.update(user, id, dto);
  }

  @Delete('axes/:id')
  @Roles(...CALIBRATORS)
  @HttpCode(204)
  @ConflictsWhen('approval-lock')
  remove(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string) {
    return this.axes.delete(user, id);
  }

  @Get('axes/:id/speed-check')
  speedCheck(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string) {
    return this.checks.speedCheck(user, id);
  }
}

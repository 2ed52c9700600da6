import { Body, Controller, Get, Param, ParseUUIDPipe, Patch, Post, Query } from '@nestjs/common';
import { CurrentUser, RECORDERS, Roles } from '../auth/decorators.js';
import type { SessionUser } from '../auth/session-user.js';
import { CreateMachineDto } from './dto/create-machine.dto.js';
import { UpdateMachineDto } from './dto/update-machine.dto.js';
import { MachinesService } from './machines.service.js';
import { HistoryQueryDto } from '../history/dto/history-query.dto.js';
import { ConflictsWhen } from '../openapi/error-responses.js';

@Controller('machines')
export class MachinesController {
  constructor(private readonly machines: MachinesService) {}

  @Get()
  list(@CurrentUser() user: SessionUser) {
    return this.machines.list(user);
  }

  @Post()
  @Roles(...RECORDERS)
  create(@CurrentUser() user: SessionUser, @Body() dto: CreateMachineDto) {
    return this.machines.create(user, dto);
  }

  @Get(':id')
  get(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string) {
    return this.machines.get(user, id);
  }

  @Patch(':id')
  @Roles(...RECORDERS)
  @ConflictsWhen('approval-lock')
  update(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string, @Body() dto: UpdateMachineDto) {
    return this.machines.update(user, id, dto);
  }

  @Get(':id/history')
  history(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string, @Query() query: HistoryQueryDto) {
    return this.machines.history(user, id, query);
  }
}

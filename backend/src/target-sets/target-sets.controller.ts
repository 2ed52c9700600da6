import { Body, Controller, Get, Param, ParseUUIDPipe, Patch, Post } from '@nestjs/common';
import { CurrentUser, Roles } from '../auth/decorators.js';
import type { SessionUser } from '../auth/session-user.js';
import { CreateTargetSetDto, UpdateTargetSetDto } from './dto/target-set.dto.js';
import { TargetSetsService } from './target-sets.service.js';

@Controller('target-sets')
export class TargetSetsController {
  constructor(private readonly sets: TargetSetsService) {}

  @Get()
  list(@CurrentUser() user: SessionUser) {
    return this.sets.list(user);
  }

  @Get(':id')
  get(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string) {
    return this.sets.get(user, id);
  }

  @Post()
  @Roles('owner', 'admin')
  create(@CurrentUser() user: SessionUser, @Body() dto: CreateTargetSetDto) {
    return this.sets.create(user, dto);
  }

  @Patch(':id')
  @Roles('owner', 'admin')
  update(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string, @Body() dto: UpdateTargetSetDto) {
    return this.sets.update(user, id, dto);
  }
}

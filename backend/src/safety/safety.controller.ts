import { Body, Controller, Get, Param, ParseUUIDPipe, Post, Put } from '@nestjs/common';
import { CurrentUser, Roles } from '../auth/decorators.js';
import type { SessionUser } from '../auth/session-user.js';
import type { Role } from '../database/schema/users.js';
import { AnswerItemDto } from './dto/answer-item.dto.js';
import { CreateSafetyItemDto } from './dto/create-safety-item.dto.js';
import { SafetyService } from './safety.service.js';
import { ConflictsWhen } from '../openapi/error-responses.js';

// The walk is walked by the people who commission and sign off the machine, not by builders.
const WALKERS: Role[] = ['admin', 'owner', 'technician'];

@Controller()
export class SafetyController {
  constructor(private readonly safety: SafetyService) {}

  @Get('machines/:id/safety-walk')
  walk(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string) {
    return this.safety.walk(user, id);
  }

  @Put('machines/:id/safety-walk/items/:itemId')
  @Roles(...WALKERS)
  @ConflictsWhen('approval-lock')
  answer(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) id: string,
    @Param('itemId') itemId: string,
    @Body() dto: AnswerItemDto,
  ) {
    return this.safety.answer(user, id, itemId, dto);
  }

  @Post('machines/:id/safety-walk/rounds')
  @Roles(...WALKERS)
  @ConflictsWhen('approval-lock', 'state')
  startNew(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string) {
    return this.safety.startNew(user, id);
  }

  @Get('safety-items')
  items(@CurrentUser() user: SessionUser) {
    return this.safety.listItems(user);
  }

  @Post('safety-items')
  @Roles('owner', 'admin')
  addItem(@CurrentUser() user: SessionUser, @Body() dto: CreateSafetyItemDto) {
    return this.safety.addItem(user, dto);
  }
}

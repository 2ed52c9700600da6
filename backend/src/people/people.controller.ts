import { Body, Controller, Get, Param, ParseUUIDPipe, Patch, Post } from '@nestjs/common';
import { CurrentUser, Roles } from '../auth/decorators.js';
import type { SessionUser } from '../auth/session-user.js';
import { CreatePersonDto } from './dto/create-person.dto.js';
import { UpdatePersonDto } from './dto/update-person.dto.js';
import { PeopleService } from './people.service.js';
import { ConflictsWhen } from '../openapi/error-responses.js';

@Controller('people')
@Roles('admin')
export class PeopleController {
  constructor(private readonly people: PeopleService) {}

  @Get()
  list(@CurrentUser() user: SessionUser) {
    return this.people.list(user);
  }

  @Post()
  @ConflictsWhen('taken')
  add(@CurrentUser() user: SessionUser, @Body() dto: CreatePersonDto) {
    return this.people.add(user, dto);
  }

  @Post(':id/invitation')
  @ConflictsWhen('state')
  resendInvitation(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string) {
    return this.people.resendInvitation(user, id);
  }

  /** Resets an existing member's password: the link goes to their own e-mail only. */
  @Post(':id/password-reset')
  @ConflictsWhen('state')
  resetPassword(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string) {
    return this.people.resetPassword(user, id);
  }

  @Patch(':id')
  @ConflictsWhen('state')
  update(@CurrentUser() user: SessionUser, @Param('id', ParseUUIDPipe) id: string, @Body() dto: UpdatePersonDto) {
    return this.people.update(user, id, dto);
  }
}

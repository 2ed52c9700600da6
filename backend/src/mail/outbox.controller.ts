import { Controller, Get, Header, NotFoundException, Param, ParseIntPipe, ParseUUIDPipe, Res } from '@nestjs/common';
import type { FastifyReply } from 'fastify';
import { CurrentUser, Roles } from '../auth/decorators.js';
import type { SessionUser } from '../auth/session-user.js';
import { MailService, WORKSHOP_HEADER } from './mail.service.js';
import { toOutboxMessage } from './outbox.mapper.js';
import { create as contentDisposition } from 'content-disposition';
import { ApiParam, ApiProduces } from '@nestjs/swagger';

/** The development outbox: what the fake SMTP server caught for this workshop. Admins only. */
@Controller('dev/outbox')
@Roles('admin')
export class OutboxController {
  constructor(private readonly mail: MailService) {}

  @Get()
  @Header('Cache-Control', 'no-store')
  list(@CurrentUser() user: SessionUser) {
    return this.mine(user).map(toOutboxMessage);
  }

  @Get(':id/attachments/:index')
  @ApiProduces('application/octet-stream')
  @ApiParam({
    name: 'index',
    type: 'integer',
    description: 'The attachment, index from 0 (its `attachments[].index`).',
  })
  attachment(
    @CurrentUser() user: SessionUser,
    @Param('id', ParseUUIDPipe) id: string,
    @Param('index', ParseIntPipe) index: number,
    @Res({ passthrough: true }) reply: FastifyReply,
  ) {
    const file = this.mine(user).find((m) => m.id === id)?.attachments[index];
    if (!file) throw new NotFoundException('No such attachment in the outbox');
    reply.header('Content-Type', file.contentType);
    reply.header('Content-Disposition', contentDisposition(file.filename));
    return file.content;
  }

  private mine(user: SessionUser) {
    const fake = this.mail.fake;
    if (!fake)
      throw new NotFoundException(
        'The outbox exists only while the local fake mail server is in use (SMTP_HOST not set)',
      );
    const header = WORKSHOP_HEADER.toLowerCase();
    return fake.messages.filter((m) => m.headers[header] === user.workshopId);
  }
}

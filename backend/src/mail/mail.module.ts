import { Module } from '@nestjs/common';
import { MailLinks } from './mail-links.js';
import { MailService } from './mail.service.js';
import { OutboxController } from './outbox.controller.js';

@Module({
  controllers: [OutboxController],
  providers: [MailService, MailLinks],
  exports: [MailService, MailLinks],
})
export class MailModule {}

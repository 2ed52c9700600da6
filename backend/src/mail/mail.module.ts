import { Module } from '@nestjs/common';
import { MailService } from './mail.service.js';
import { OutboxController } from './outbox.controller.js';

@Module({
  controllers: [OutboxController],
  providers: [MailService],
  exports: [MailService],
})
export class MailModule {}

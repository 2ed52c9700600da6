import { Module } from '@nestjs/common';
import { MailModule } from '../mail/mail.module.js';
import { PeopleController } from './people.controller.js';
import { PeopleRepository } from './people.repository.js';
import { PeopleService } from './people.service.js';

@Module({
  imports: [MailModule],
  controllers: [PeopleController],
  providers: [PeopleRepository, PeopleService],
  exports: [PeopleService, PeopleRepository],
})
export class PeopleModule {}

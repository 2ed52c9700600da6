import { Controller, Get, Query } from '@nestjs/common';
import { CurrentUser, Roles } from '../auth/decorators.js';
import type { SessionUser } from '../auth/session-user.js';
import { RecordsService } from '../records/records.service.js';
import { HistoryQueryDto } from './dto/history-query.dto.js';

/** The workshop's whole history: people, roles, sign-ins, target sets and every machine's records. */
@Controller('history')
@Roles('admin', 'owner')
export class HistoryController {
  constructor(private readonly records: RecordsService) {}

  @Get()
  list(@CurrentUser() user: SessionUser, @Query() query: HistoryQueryDto) {
    return this.records.history(user.workshopId, query);
  }
}

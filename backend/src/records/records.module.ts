import { Global, Module } from '@nestjs/common';
import { CheckRecordsRepository } from './check-records.repository.js';
import { ReadinessRegistry } from './readiness.registry.js';
import { ReadinessSummaryRepository } from './readiness-summary.repository.js';
import { ReadinessSummaryService } from './readiness-summary.service.js';
import { RecordsRepository } from './records.repository.js';
import { RecordsService } from './records.service.js';
import { SubjectsRegistry } from './subjects.registry.js';

/** Shared by every domain module: audit history, approval locks, readiness contributors, check records. */
@Global()
@Module({
  providers: [
    RecordsRepository,
    RecordsService,
    ReadinessRegistry,
    SubjectsRegistry,
    ReadinessSummaryRepository,
    ReadinessSummaryService,
    CheckRecordsRepository,
  ],
  exports: [CheckRecordsRepository, RecordsService, ReadinessRegistry, SubjectsRegistry, ReadinessSummaryService],
})
export class RecordsModule {}

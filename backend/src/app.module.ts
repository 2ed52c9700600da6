import { Module, type DynamicModule } from '@nestjs/common';
import { APP_INTERCEPTOR } from '@nestjs/core';
import { ScheduleModule } from '@nestjs/schedule';
import { appConfigModule } from './config/app-config.module.js';
import { CommandTransactionInterceptor } from './database/command-transaction.interceptor.js';
import { AuthModule } from './auth/auth.module.js';
import { DatabaseModule } from './database/database.module.js';
import { EngineWorkerModule } from './engine-worker/engine-worker.module.js';
import { HealthModule } from './health/health.module.js';
import { PeopleModule } from './people/people.module.js';
import { RecordsModule } from './records/records.module.js';
import { MachinesModule } from './machines/machines.module.js';
import { CalculatorsModule } from './calculators/calculators.module.js';
import { RailsModule } from './rails/rails.module.js';
import { BoltDownsModule } from './bolt-downs/bolt-downs.module.js';
import { FrameModule } from './frame/frame.module.js';
import { SafetyModule } from './safety/safety.module.js';
import { EvidenceModule } from './evidence/evidence.module.js';
import { DrivesModule } from './drives/drives.module.js';
import { MailModule } from './mail/mail.module.js';
import { ApprovalsModule } from './approvals/approvals.module.js';
import { HistoryModule } from './history/history.module.js';
import { HolePatternsModule } from './hole-patterns/hole-patterns.module.js';
import { ExportsModule } from './exports/exports.module.js';

// One line per domain module.
@Module({
  imports: [
    ScheduleModule.forRoot(),
    DatabaseModule,
    EngineWorkerModule,
    AuthModule,
    HealthModule,
    PeopleModule,
    RecordsModule,
    MachinesModule,
    CalculatorsModule,
    RailsModule,
    BoltDownsModule,
    FrameModule,
    SafetyModule,
    EvidenceModule,
    DrivesModule,
    MailModule,
    ApprovalsModule,
    HistoryModule,
    HolePatternsModule,
    ExportsModule,
  ],
  providers: [{ provide: APP_INTERCEPTOR, useClass: CommandTransactionInterceptor }],
})
export class AppModule {
  /** The application for one environment: ConfigModule checks it and serves it as ConfigService. */
  static for(env: NodeJS.ProcessEnv): DynamicModule {
    return { module: AppModule, imports: [appConfigModule(env)] };
  }
}

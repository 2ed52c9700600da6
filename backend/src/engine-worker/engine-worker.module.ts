import { Global, Module } from '@nestjs/common';
import { APP_INTERCEPTOR } from '@nestjs/core';
import { EnginePool } from './engine-pool.js';
import { LargeResponseInterceptor } from './large-response.interceptor.js';

/** One worker pool for the process: large fits, large bodies parsed and large answers written. */
@Global()
@Module({
  providers: [EnginePool, { provide: APP_INTERCEPTOR, useClass: LargeResponseInterceptor }],
  exports: [EnginePool],
})
export class EngineWorkerModule {}

import { Inject, Logger, Module, type OnApplicationShutdown, type OnModuleInit } from '@nestjs/common';
import { MachinesModule } from '../machines/machines.module.js';
import { EvidenceController } from './evidence.controller.js';
import { EVIDENCE_CONFIG, loadEvidenceConfig, type EvidenceConfig } from './evidence.config.js';
import { EvidenceRepository } from './evidence.repository.js';
import { EvidenceService } from './evidence.service.js';
import { EvidenceSubjects } from './evidence-subjects.js';
import { EvidenceUploadService } from './evidence-upload.service.js';
import { DiskStorage } from './storage/disk-storage.js';
import { EVIDENCE_STORAGE, type EvidenceStorage } from './storage/evidence-storage.js';
import { S3Storage } from './storage/s3-storage.js';

const STALE_UPLOAD_MS = 60 * 60 * 1000;

@Module({
  imports: [MachinesModule],
  controllers: [EvidenceController],
  providers: [
    { provide: EVIDENCE_CONFIG, useFactory: () => loadEvidenceConfig() },
    {
      provide: EVIDENCE_STORAGE,
      inject: [EVIDENCE_CONFIG],
      useFactory: (config: EvidenceConfig): EvidenceStorage =>
        config.driver === 's3' && config.s3 ? new S3Storage(config.s3) : new DiskStorage(config.diskRoot),
    },
    EvidenceRepository,
    EvidenceSubjects,
    EvidenceService,
    EvidenceUploadService,
  ],
  exports: [EvidenceService],
})
export class EvidenceModule implements OnModuleInit, OnApplicationShutdown {
  private readonly logger = new Logger('Evidence');

  constructor(@Inject(EVIDENCE_STORAGE) private readonly storage: EvidenceStorage) {}

  onModuleInit() {
    // Not awaited: a slow disk or bucket must not hold up the start.
    if (this.storage instanceof DiskStorage) {
      this.storage
        .sweepIncoming(STALE_UPLOAD_MS)
        .catch((err) => this.logger.warn(`could not tidy unfinished uploads: ${(err as Error).message}`));
    }
    if (this.storage instanceof S3Storage) {
      this.storage
        .reachable()
        .then(
          (ok) =>
            ok ||
            this.logger.warn(
              'The S3 bucket does not answer: uploads will fail until it does (check S3_ENDPOINT, S3_BUCKET and the keys)',
            ),
        );
    }
  }

  onApplicationShutdown() {
    if (this.storage instanceof S3Storage) this.storage.destroy();
  }
}

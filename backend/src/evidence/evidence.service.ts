import {
  BadRequestException,
  ForbiddenException,
  Inject,
  Injectable,
  Logger,
  NotFoundException,
  StreamableFile,
} from '@nestjs/common';
import type { SessionUser } from '../auth/session-user.js';
import { MachinesService } from '../machines/machines.service.js';
import { RecordsService } from '../records/records.service.js';
import type { SignedRecordType } from '../records/kinds.js';
import { ACCEPTED_TYPES } from './content-type.js';
import { EVIDENCE_CONFIG, type EvidenceConfig } from './evidence.config.js';
import { toEvidenceResponse, type EvidenceResponse } from './evidence.mapper.js';
import { EvidenceRepository, type EvidenceRow } from './evidence.repository.js';
import { EvidenceSubjects } from './evidence-subjects.js';
import { contentDisposition } from './file-name.js';
import type { ListEvidenceQueryDto } from './dto/list-evidence.query.js';
import { EVIDENCE_STORAGE, type EvidenceStorage } from './storage/evidence-storage.js';
import { THUMBNAIL_TYPE } from './thumbnail.js';

/** Roles that may delete anyone's evidence; others only what they attached themselves. */
const DELETES_ANY = new Set(['owner', 'admin']);

export interface Download {
  file: StreamableFile;
  headers: Record<string, string>;
}

@Injectable()
export class EvidenceService {
  private readonly logger = new Logger(EvidenceService.name);

  constructor(
    private readonly repo: EvidenceRepository,
    private readonly subjects: EvidenceSubjects,
    private readonly machines: MachinesService,
    private readonly records: RecordsService,
    @Inject(EVIDENCE_STORAGE) private readonly storage: EvidenceStorage,
    @Inject(EVIDENCE_CONFIG) private readonly config: EvidenceConfig,
  ) {}

  limits() {
    return {
      maxBytes: this.config.maxBytes,
      accepted: ACCEPTED_TYPES.map((t) => ({
        contentType: t.contentType,
        label: t.label,
        kind: t.kind,
        extensions: t.extensions,
      })),
    };
  }

  async list(actor: SessionUser, query: ListEvidenceQueryDto): Promise<EvidenceResponse[]> {
    if (query.machineId && !query.subjectType && !query.subjectId) {
      await this.machines.getRef(actor, query.machineId);
      return this.present(actor, await this.repo.listByMachine(actor.workshopId, query.machineId));
    }
    if (!query.subjectType || !query.subjectId || query.machineId) {
      throw new BadRequestException(['Ask for one subject (subjectType and subjectId) or one machine (machineId)']);
    }
    await this.subjects.resolve(actor.workshopId, query.subjectType, query.subjectId);
    return this.present(actor, await this.repo.listBySubject(actor.workshopId, query.subjectType, query.subjectId));
  }

  async get(actor: SessionUser, id: string): Promise<EvidenceResponse> {
    const [item] = await this.present(actor, [await this.row(actor, id)]);
    return item;
  }

  async content(actor: SessionUser, id: string): Promise<Download> {
    const row = await this.row(actor, id);
    const stored = await this.storage.read(row.storageKey);
    if (!stored) {
      this.logger.error(`evidence ${row.id}: stored object ${row.storageKey} is missing`);
      throw new NotFoundException('The stored file is missing; attach it again');
    }
    const type = row.contentType === 'text/csv' ? 'text/csv; charset=utf-8' : row.contentType;
    const disposition = contentDisposition(row.kind === 'photo' ? 'inline' : 'attachment', row.fileName);
    return {
      file: new StreamableFile(stored.stream, { type, disposition, length: stored.sizeBytes }),
      headers: safeHeaders(),
    };
  }

  async thumbnail(actor: SessionUser, id: string): Promise<Download> {
    const row = await this.row(actor, id);
    const stored = row.thumbnailKey ? await this.storage.read(row.thumbnailKey) : null;
    if (!stored) throw new NotFoundException('This evidence has no thumbnail');
    const name = row.fileName.replace(/\.[^.]*$/, '') + '-thumbnail.webp';
    return {
      file: new StreamableFile(stored.stream, {
        type: THUMBNAIL_TYPE,
        disposition: contentDisposition('inline', name),
        length: stored.sizeBytes,
      }),
      headers: safeHeaders(),
    };
  }

  async remove(actor: SessionUser, id: string): Promise<void> {
    const row = await this.row(actor, id);
    if (!DELETES_ANY.has(actor.role) && row.uploadedById !== actor.id) {
      throw new ForbiddenException('Only the person who attached it, an owner or an admin can delete this evidence');
    }
    const ref = await this.subjects.labelOf(actor.workshopId, row.subjectType, row.subjectId);
    const label = ref?.label ?? row.subjectLabel;
    await this.records.assertEditable(
      ref?.recordType ?? row.recordType,
      ref?.recordId ?? row.recordId,
      `The evidence of ${label}`,
    );
    await this.repo.delete(actor.workshopId, id);
    for (const key of [row.storageKey, row.thumbnailKey]) {
      if (key)
        await this.storage
          .remove(key)
          .catch((err) => this.logger.warn(`could not remove ${key}: ${(err as Error).message}`));
    }
    await this.records.audit(actor, {
      machineId: row.machineId,
      recordType: 'evidence',
      recordId: row.id,
      action: 'deleted',
      summary: `${row.kind === 'photo' ? 'Photo' : 'File'} ${row.fileName} removed from ${label}`,
      changes: { subjectType: row.subjectType, subjectId: row.subjectId, fileName: row.fileName },
    });
  }

  private async row(actor: SessionUser, id: string): Promise<EvidenceRow> {
    const row = await this.repo.find(actor.workshopId, id);
    if (!row) throw new NotFoundException('No such evidence in this workshop');
    return row;
  }

  /** Rows with their subjects' current names, their locks and what the caller may do. */
  private async present(actor: SessionUser, rows: EvidenceRow[]): Promise<EvidenceResponse[]> {
    const labels = new Map<string, string>();
    const refs = new Map<string, { recordType: SignedRecordType; recordId: string }>();
    for (const row of rows) {
      const key = `${row.subjectType}:${row.subjectId}`;
      if (labels.has(key)) continue;
      const ref = await this.subjects.labelOf(actor.workshopId, row.subjectType, row.subjectId);
      labels.set(key, ref?.label ?? row.subjectLabel);
      refs.set(key, ref ?? { recordType: row.recordType, recordId: row.recordId });
    }
    const byType = new Map<SignedRecordType, string[]>();
    for (const ref of refs.values()) byType.set(ref.recordType, [...(byType.get(ref.recordType) ?? []), ref.recordId]);
    const locked = new Set<string>();
    for (const [recordType, ids] of byType) {
      for (const lockedId of await this.records.lockedIds(recordType, ids)) locked.add(`${recordType}:${lockedId}`);
    }
    return rows.map((row) => {
      const key = `${row.subjectType}:${row.subjectId}`;
      const ref = refs.get(key)!;
      const isLocked = locked.has(`${ref.recordType}:${ref.recordId}`);
      const mayDelete = actor.role !== 'viewer' && (DELETES_ANY.has(actor.role) || row.uploadedById === actor.id);
      return toEvidenceResponse(row, {
        subjectLabel: labels.get(key),
        locked: isLocked,
        canDelete: mayDelete && !isLocked,
      });
    });
  }
}

/** Stored bytes are served as what they were checked to be, never sniffed into something else. */
function safeHeaders(): Record<string, string> {
  return {
    'x-content-type-options': 'nosniff',
    'cache-control': 'private, max-age=86400',
    'content-security-policy': "default-src 'none'; img-src 'self'; style-src 'unsafe-inline'; sandbox",
  };
}

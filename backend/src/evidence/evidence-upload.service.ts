import {
  BadRequestException,
  Inject,
  Injectable,
  Logger,
  PayloadTooLargeException,
  UnsupportedMediaTypeException,
} from '@nestjs/common';
import type { MultipartFile, MultipartValue } from '@fastify/multipart';
import { plainToInstance } from 'class-transformer';
import { validate } from 'class-validator';
import type { FastifyRequest } from 'fastify';
import { randomUUID } from 'node:crypto';
import { pipeline, type Readable } from 'node:stream';
import type { SessionUser } from '../auth/session-user.js';
import type { EvidenceSubjectType } from '../records/kinds.js';
import type { SubjectRef } from '../records/subjects.registry.js';
import { MachinesService } from '../machines/machines.service.js';
import { APPROVED_STATES } from '../database/schema/machines.js';
import { RecordsService } from '../records/records.service.js';
import { decideType, type AcceptedType } from './content-type.js';
import { UploadFieldsDto } from './dto/upload-fields.dto.js';
import { EVIDENCE_CONFIG, type EvidenceConfig } from './evidence.config.js';
import { toEvidenceResponse, type EvidenceResponse } from './evidence.mapper.js';
import { EvidenceRepository } from './evidence.repository.js';
import { EvidenceSubjects } from './evidence-subjects.js';
import { sanitizeFileName, withExtension } from './file-name.js';
import { EVIDENCE_STORAGE, type EvidenceStorage } from './storage/evidence-storage.js';
import { makeThumbnail, MAX_PHOTO_MEGAPIXELS, THUMBNAIL_TYPE, type Thumbnail } from './thumbnail.js';
import { UploadInspector } from './upload-inspector.js';
import { tooLarge, translateMultipartError } from './upload-errors.js';

interface Received {
  tempKey: string;
  rawName: string;
  inspector: UploadInspector;
}

/**
 * One upload, start to end: stream the file to a temporary object while inspecting it, check
 * the fields, the subject, the size and the type from the bytes, make the thumbnail, and only
 * then commit the object and write the row. Anything refused is removed before answering.
 */
@Injectable()
export class EvidenceUploadService {
  private readonly logger = new Logger(EvidenceUploadService.name);

  constructor(
    private readonly repo: EvidenceRepository,
    private readonly subjects: EvidenceSubjects,
    private readonly records: RecordsService,
    @Inject(EVIDENCE_STORAGE) private readonly storage: EvidenceStorage,
    @Inject(EVIDENCE_CONFIG) private readonly config: EvidenceConfig,
    private readonly machines: MachinesService,
  ) {}

  async upload(actor: SessionUser, req: FastifyRequest): Promise<EvidenceResponse> {
    if (!req.isMultipart())
      throw new BadRequestException([
        'Send the upload as multipart/form-data with the photo or file in a field named file',
      ]);
    const fields: Record<string, string> = {};
    let received: Received | null = null;
    let committed = false;
    try {
      for await (const part of req.parts()) {
        if (part.type === 'field') {
          const value = (part as MultipartValue).value;
          fields[part.fieldname] = typeof value === 'string' ? value : String(value);
          continue;
        }
        const file = part as MultipartFile;
        if (file.fieldname !== 'file') {
          file.file.resume();
          throw new BadRequestException([
            `${file.fieldname} should not exist: send the photo or file in a field named file`,
          ]);
        }
        // Fields sent ahead of the file are checked before a byte is stored.
        if (fields.subjectType !== undefined || fields.subjectId !== undefined) {
          await this.checkedSubject(actor, fields).catch((err) => {
            file.file.resume();
            throw err;
          });
        }
        received = await this.receive(file);
      }
      if (!received) throw new BadRequestException(['file is required: attach one photo or file']);
      // Checked again with every field, as fields may also follow the file (or repeat).
      const subject = await this.checkedSubject(actor, fields);
      const saved = await this.store(actor, subject, fields, received);
      committed = true;
      return saved;
    } catch (err) {
      throw translateMultipartError(err, this.config.maxBytes);
    } finally {
      if (received && !committed) await this.storage.discard(received.tempKey).catch(() => undefined);
    }
  }

  /**
   * The same checks for a file made on the server (the demo seed): the stream is stored and
   * checked exactly as an upload is, the size limit included.
   */
  async attach(
    actor: SessionUser,
    fields: { subjectType: string; subjectId: string; caption?: string },
    file: { name: string; stream: Readable },
  ): Promise<EvidenceResponse> {
    const values: Record<string, string> = {
      subjectType: fields.subjectType,
      subjectId: fields.subjectId,
      ...(fields.caption ? { caption: fields.caption } : {}),
    };
    const subject = await this.checkedSubject(actor, values);
    const received = await this.receiveStream(file.stream, file.name);
    let committed = false;
    try {
      if (received.inspector.result().sizeBytes > this.config.maxBytes)
        throw new PayloadTooLargeException(tooLarge(file.name, this.config.maxBytes));
      const saved = await this.store(actor, subject, values, received);
      committed = true;
      return saved;
    } finally {
      if (!committed) await this.storage.discard(received.tempKey).catch(() => undefined);
    }
  }

  private async receive(file: MultipartFile): Promise<Received> {
    const received = await this.receiveStream(file.file, file.filename);
    if (file.file.truncated) {
      await this.storage.discard(received.tempKey).catch(() => undefined);
      throw new PayloadTooLargeException(tooLarge(file.filename, this.config.maxBytes));
    }
    return received;
  }

  private async receiveStream(stream: Readable, rawName: string): Promise<Received> {
    const inspector = new UploadInspector();
    const source = pipeline(stream, inspector, () => undefined);
    const tempKey = await this.storage.writeTemp(source);
    return { tempKey, rawName, inspector };
  }

  private async checkedSubject(
    actor: SessionUser,
    fields: Record<string, string>,
  ): Promise<SubjectRef & { subjectType: EvidenceSubjectType }> {
    const dto = plainToInstance(UploadFieldsDto, fields);
    const errors = await validate(dto, { whitelist: true, forbidNonWhitelisted: true });
    if (errors.length) throw new BadRequestException(errors.flatMap((e) => Object.values(e.constraints ?? {})));
    return this.subjects.resolve(actor.workshopId, dto.subjectType, dto.subjectId);
  }

  private async store(
    actor: SessionUser,
    subject: SubjectRef & { subjectType: EvidenceSubjectType },
    fields: Record<string, string>,
    received: Received,
  ): Promise<EvidenceResponse> {
    const sniff = received.inspector.result();
    const shownName = sanitizeFileName(received.rawName);
    if (sniff.sizeBytes === 0) throw new BadRequestException([`${shownName} is empty (0 bytes)`]);
    const decision = await decideType(shownName, sniff);
    if ('refused' in decision) throw new UnsupportedMediaTypeException(decision.refused);
    const type = decision.accepted;
    const fileName = withExtension(shownName, type.extensions);
    const thumb = type.kind === 'photo' ? await this.thumbnailOf(received.tempKey, fileName, type) : null;

    // Evidence may still be added while an approval stands, marked as such: it was not signed.
    const machine = await this.machines.lockForCommand(actor, subject.machineId);
    const addedAfterApproval = APPROVED_STATES.includes(machine.state);
    const id = randomUUID();
    const key = `${actor.workshopId}/${subject.machineId}/${id}`;
    const thumbnailKey = thumb ? `${key}.thumb.webp` : null;
    await this.storage.commit(received.tempKey, key, type.contentType);
    try {
      if (thumb && thumbnailKey) await this.storage.put(thumbnailKey, thumb.body, THUMBNAIL_TYPE);
      const row = await this.repo.insert({
        id,
        workshopId: actor.workshopId,
        machineId: subject.machineId,
        subjectType: subject.subjectType,
        subjectId: fields.subjectId,
        subjectLabel: subject.label,
        recordType: subject.recordType,
        recordId: subject.recordId,
        kind: type.kind,
        fileName,
        caption: (fields.caption ?? '').trim(),
        contentType: type.contentType,
        sizeBytes: sniff.sizeBytes,
        sha256: sniff.sha256,
        storageKey: key,
        thumbnailKey,
        widthPx: thumb?.widthPx ?? null,
        heightPx: thumb?.heightPx ?? null,
        uploadedById: actor.id,
        uploadedByName: actor.name,
        addedAfterApproval,
      });
      await this.records.audit(actor, {
        machineId: subject.machineId,
        recordType: 'evidence',
        recordId: id,
        action: 'attached',
        summary: `${type.kind === 'photo' ? 'Photo' : 'File'} ${fileName} attached to ${subject.label}${addedAfterApproval ? ' after the approval (not part of what was signed)' : ''}`,
        changes: {
          subjectType: fields.subjectType,
          subjectId: fields.subjectId,
          contentType: type.contentType,
          sizeBytes: sniff.sizeBytes,
        },
      });
      return toEvidenceResponse(row, { locked: false, canDelete: true });
    } catch (err) {
      // The object is committed but the record is not: take both back out.
      await this.storage.remove(key).catch(() => undefined);
      if (thumbnailKey) await this.storage.remove(thumbnailKey).catch(() => undefined);
      throw err;
    }
  }

  private async thumbnailOf(tempKey: string, fileName: string, type: AcceptedType): Promise<Thumbnail> {
    const stored = await this.storage.read(tempKey);
    if (!stored) throw new Error(`temporary upload ${tempKey} vanished`);
    try {
      return await makeThumbnail(stored.stream);
    } catch (err) {
      stored.stream.destroy();
      const message = (err as Error).message;
      if (/pixel limit/i.test(message)) {
        throw new UnsupportedMediaTypeException(
          `${fileName} has more than ${MAX_PHOTO_MEGAPIXELS} megapixels; save it smaller and attach it again`,
        );
      }
      this.logger.warn(`photo refused, not readable: ${message}`);
      throw new UnsupportedMediaTypeException(
        `${fileName} starts like a ${type.label} photo but could not be read as one (damaged or cut short?)`,
      );
    }
  }
}

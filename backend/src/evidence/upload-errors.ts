import {
  BadRequestException,
  HttpException,
  PayloadTooLargeException,
  ServiceUnavailableException,
} from '@nestjs/common';
import { sanitizeFileName } from './file-name.js';

export function tooLarge(name: string, maxBytes: number): string {
  return `${sanitizeFileName(name)} is larger than the limit of ${formatBytes(maxBytes)} a file`;
}

export function formatBytes(bytes: number): string {
  if (bytes >= 1024 * 1024) return `${+(bytes / (1024 * 1024)).toFixed(1)} MB`;
  if (bytes >= 1024) return `${+(bytes / 1024).toFixed(1)} kB`;
  return `${bytes} bytes`;
}

/** The multipart parser's own errors, as clear 4xx answers. */
export function translateMultipartError(err: unknown, maxBytes: number): unknown {
  const code = (err as { code?: string })?.code;
  if (code === 'FST_REQ_FILE_TOO_LARGE') {
    const name = (err as { part?: { filename?: string } }).part?.filename ?? 'The file';
    return new PayloadTooLargeException(tooLarge(name, maxBytes));
  }
  if (code === 'FST_FILES_LIMIT')
    return new BadRequestException(['Send one file per upload; several files go up as several uploads']);
  if (code === 'FST_PARTS_LIMIT' || code === 'FST_FIELDS_LIMIT')
    return new BadRequestException(['Too many fields: send file, subjectType, subjectId and caption only']);
  if (
    code === 'FST_PROTO_VIOLATION' ||
    code === 'FST_INVALID_MULTIPART_CONTENT_TYPE' ||
    code === 'FST_INVALID_JSON_FIELD_ERROR'
  )
    return new BadRequestException(['The upload is not a well-formed multipart/form-data body']);
  if (err instanceof Error && /Unexpected end of (multipart|form)|terminated early|Malformed/i.test(err.message)) {
    return new BadRequestException(['The upload was cut off before it finished; try again']);
  }
  if (code === 'FST_MP_PREMATURE_CLOSE' || code === 'ERR_STREAM_PREMATURE_CLOSE') {
    return new BadRequestException(['The upload was cut off before it finished; try again']);
  }
  if (
    err instanceof Error &&
    /Multipart: |Boundary required|needle|Unsupported content type|Malformed part header/i.test(err.message)
  ) {
    return new BadRequestException(['The upload is not a well-formed multipart/form-data body']);
  }
  if (isStorageFailure(err)) {
    return new ServiceUnavailableException(
      'The file store did not answer, so nothing was kept. Try again in a moment.',
    );
  }
  return err;
}

// S3 SDK errors carry $metadata; disk and network failures carry a system error code.
const SYSTEM_CODES = new Set([
  'ECONNREFUSED',
  'ECONNRESET',
  'ETIMEDOUT',
  'ENOTFOUND',
  'EAI_AGAIN',
  'ENOSPC',
  'EROFS',
  'EACCES',
  'EPERM',
  'EIO',
]);

function isStorageFailure(err: unknown): boolean {
  if (!err || typeof err !== 'object' || err instanceof HttpException) return false;
  const e = err as { $metadata?: unknown; code?: string; cause?: { code?: string } };
  return e.$metadata !== undefined || SYSTEM_CODES.has(e.code ?? '') || SYSTEM_CODES.has(e.cause?.code ?? '');
}

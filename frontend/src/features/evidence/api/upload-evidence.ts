import { ApiError } from '../../../lib/api-client';
import type { Evidence, EvidenceSubject } from '../types';

export interface UploadInput extends EvidenceSubject {
  file: File;
  caption?: string;
}

export interface UploadHandle {
  done: Promise<Evidence>;
  abort: () => void;
}

/**
 * POST /api/evidence as multipart form data. XMLHttpRequest rather than fetch, because only it
 * reports upload progress. The fields go ahead of the file so the server checks them first.
 */
export function uploadEvidence(input: UploadInput, onProgress: (fraction: number) => void): UploadHandle {
  const xhr = new XMLHttpRequest();
  const done = new Promise<Evidence>((resolve, reject) => {
    const form = new FormData();
    form.append('subjectType', input.subjectType);
    form.append('subjectId', input.subjectId);
    if (input.caption?.trim()) form.append('caption', input.caption.trim());
    form.append('file', input.file, input.file.name);
    xhr.open('POST', '/api/evidence');
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.responseType = 'text';
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable && e.total > 0) onProgress(e.loaded / e.total);
    };
    xhr.onload = () => {
      const body = parse(xhr.responseText);
      if (xhr.status >= 200 && xhr.status < 300) {
        onProgress(1);
        resolve(body as Evidence);
        return;
      }
      const messages = messagesOf(body);
      reject(new ApiError(xhr.status, messages[0] ?? `The server answered ${xhr.status}`, messages, body));
    };
    xhr.onerror = () => reject(new ApiError(0, 'The upload could not reach the server. Check the connection and try again.'));
    xhr.onabort = () => reject(new ApiError(0, 'Upload cancelled'));
    xhr.send(form);
  });
  return { done, abort: () => xhr.abort() };
}

function parse(text: string): unknown {
  try {
    return text ? JSON.parse(text) : null;
  } catch {
    return text;
  }
}

function messagesOf(body: unknown): string[] {
  if (!body || typeof body !== 'object') return [];
  const m = (body as { message?: unknown }).message;
  if (Array.isArray(m)) return m.map(String);
  return typeof m === 'string' ? [m] : [];
}

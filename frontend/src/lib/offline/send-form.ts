import { ApiError } from '../api/fetch-json';

/** A multipart entry (a photo or file with its fields), kept as it is on the device while it waits. */
export interface CommandForm {
  /** Text fields, sent ahead of the file so the server checks them before it stores a byte. */
  fields: Record<string, string>;
  file: Blob;
  fileName: string;
}

/** Status of a sending the person cancelled: a refusal, never tried again. */
export const CANCELLED_STATUS = 499;

type Listener = () => void;
const progress = new Map<string, number>();
const aborts = new Map<string, () => void>();
const listeners = new Set<Listener>();
const notify = () => listeners.forEach((l) => l());

/** 0…1 of the bytes of entry `key` sent so far (0 while it waits). */
export const uploadProgress = (key: string): number => progress.get(key) ?? 0;
export function onUploadProgress(listener: Listener): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}
/** Stops a sending under way; false when entry `key` is not being sent right now. */
export function abortUpload(key: string): boolean {
  const abort = aborts.get(key);
  abort?.();
  return !!abort;
}

function messagesOf(body: unknown): string[] {
  if (!body || typeof body !== 'object') return [];
  const m = (body as { message?: unknown }).message;
  if (Array.isArray(m)) return m.map(String);
  return typeof m === 'string' ? [m] : [];
}

function parse(text: string): unknown {
  try {
    return text ? JSON.parse(text) : null;
  } catch {
    return text;
  }
}

/**
 * Sends a multipart entry. XMLHttpRequest rather than fetch, because only it reports upload
 * progress; the entry's key goes in the Idempotency-Key header like every other command.
 */
export function sendForm<T>(path: string, key: string, form: CommandForm, onNoAnswer: () => void): Promise<T> {
  const xhr = new XMLHttpRequest();
  return new Promise<T>((resolve, reject) => {
    const body = new FormData();
    for (const [name, value] of Object.entries(form.fields)) body.append(name, value);
    body.append('file', form.file, form.fileName);
    xhr.open('POST', `/api${path}`);
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.setRequestHeader('Idempotency-Key', key);
    xhr.responseType = 'text';
    const set = (f: number) => {
      progress.set(key, f);
      notify();
    };
    set(0);
    aborts.set(key, () => xhr.abort());
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable && e.total > 0) set(e.loaded / e.total);
    };
    xhr.onload = () => {
      const answer = parse(xhr.responseText);
      if (xhr.status >= 200 && xhr.status < 300) {
        set(1);
        resolve(answer as T);
        return;
      }
      const messages = messagesOf(answer);
      reject(new ApiError(xhr.status, messages[0] ?? `The server answered ${xhr.status}`, messages, answer));
    };
    xhr.onerror = () => {
      onNoAnswer();
      reject(
        new ApiError(
          0,
          'The upload could not reach the server; it is kept on this device and sent when the connection returns.',
        ),
      );
    };
    xhr.onabort = () => reject(new ApiError(CANCELLED_STATUS, 'Upload cancelled'));
    xhr.send(body);
  }).finally(() => aborts.delete(key));
}

import type { Readable } from 'node:stream';

export const EVIDENCE_STORAGE = Symbol('EVIDENCE_STORAGE');

export interface StoredObject {
  stream: Readable;
  sizeBytes: number;
}

/**
 * Where evidence bytes live. An upload is streamed to a temporary key first and only committed
 * to its final key after every check has passed, so a refused upload leaves nothing behind.
 */
export interface EvidenceStorage {
  readonly driver: 'disk' | 's3';
  /** Streams the source into a new temporary object and returns its key. */
  writeTemp(source: Readable): Promise<string>;
  /** Moves a temporary object to its final key. */
  commit(tempKey: string, key: string, contentType: string): Promise<void>;
  /** Removes a temporary object; never throws for one that is already gone. */
  discard(tempKey: string): Promise<void>;
  /** Small objects made on the server (thumbnails). */
  put(key: string, body: Buffer, contentType: string): Promise<void>;
  /** null when no such object is stored. */
  read(key: string): Promise<StoredObject | null>;
  remove(key: string): Promise<void>;
}

// Keys are made by the server only; this stops a bad key ever reaching a path or a bucket.
const KEY_PATTERN = /^[a-z0-9][a-z0-9._-]*(\/[a-z0-9][a-z0-9._-]*)*$/;

export function assertSafeKey(key: string): void {
  if (!KEY_PATTERN.test(key) || key.includes('..')) throw new Error(`Refusing storage key ${JSON.stringify(key)}`);
}

export const INCOMING_PREFIX = 'incoming';

import { randomUUID } from 'node:crypto';
import { createReadStream, createWriteStream } from 'node:fs';
import { mkdir, readdir, rename, rm, stat, unlink, writeFile } from 'node:fs/promises';
import path from 'node:path';
import type { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { assertSafeKey, INCOMING_PREFIX, type EvidenceStorage, type StoredObject } from './evidence-storage.js';

/** Files under one folder (the data folder's evidence/); temporary uploads in its incoming/. */
export class DiskStorage implements EvidenceStorage {
  readonly driver = 'disk' as const;

  constructor(private readonly root: string) {}

  private pathOf(key: string): string {
    assertSafeKey(key);
    const full = path.resolve(this.root, ...key.split('/'));
    if (!full.startsWith(path.resolve(this.root) + path.sep))
      throw new Error('Refusing a path outside the evidence folder');
    return full;
  }

  async writeTemp(source: Readable): Promise<string> {
    const key = `${INCOMING_PREFIX}/${randomUUID()}`;
    const file = this.pathOf(key);
    await mkdir(path.dirname(file), { recursive: true });
    try {
      await pipeline(source, createWriteStream(file, { flags: 'wx', mode: 0o600 }));
    } catch (err) {
      await unlink(file).catch(() => undefined);
      throw err;
    }
    return key;
  }

  async commit(tempKey: string, key: string): Promise<void> {
    const target = this.pathOf(key);
    await mkdir(path.dirname(target), { recursive: true });
    await rename(this.pathOf(tempKey), target);
  }

  async discard(tempKey: string): Promise<void> {
    await rm(this.pathOf(tempKey), { force: true });
  }

  async put(key: string, body: Buffer): Promise<void> {
    const target = this.pathOf(key);
    await mkdir(path.dirname(target), { recursive: true });
    await writeFile(target, body, { mode: 0o600 });
  }

  async read(key: string): Promise<StoredObject | null> {
    const file = this.pathOf(key);
    try {
      const info = await stat(file);
      if (!info.isFile()) return null;
      return { stream: createReadStream(file), sizeBytes: info.size };
    } catch (err) {
      if ((err as NodeJS.ErrnoException).code === 'ENOENT') return null;
      throw err;
    }
  }

  async remove(key: string): Promise<void> {
    await rm(this.pathOf(key), { force: true });
  }

  /** Temporary files left by a process that stopped mid-upload. */
  async sweepIncoming(olderThanMs: number): Promise<number> {
    const dir = path.join(this.root, INCOMING_PREFIX);
    let names: string[];
    try {
      names = await readdir(dir);
    } catch {
      return 0;
    }
    let removed = 0;
    for (const name of names) {
      const file = path.join(dir, name);
      const info = await stat(file).catch(() => null);
      if (info && Date.now() - info.mtimeMs > olderThanMs) {
        await rm(file, { force: true });
        removed++;
      }
    }
    return removed;
  }
}

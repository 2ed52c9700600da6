import { createHash } from 'node:crypto';
import { Transform, type TransformCallback } from 'node:stream';
import type { SniffResult } from './content-type.js';

// Enough for every signature file-type reads for the accepted types.
const HEAD_BYTES = 16 * 1024;

/**
 * Passes an upload through unchanged while noting what the checks need: the first bytes for
 * the type, the size, a SHA-256, and whether it is all NUL-free UTF-8 (for CSV).
 */
export class UploadInspector extends Transform {
  private readonly headChunks: Buffer[] = [];
  private headBytes = 0;
  private sizeBytes = 0;
  private readonly hash = createHash('sha256');
  private readonly decoder = new TextDecoder('utf-8', { fatal: true });
  private plainText = true;

  override _transform(chunk: Buffer, _enc: BufferEncoding, done: TransformCallback): void {
    this.sizeBytes += chunk.length;
    this.hash.update(chunk);
    if (this.headBytes < HEAD_BYTES) {
      const take = chunk.subarray(0, HEAD_BYTES - this.headBytes);
      this.headChunks.push(take);
      this.headBytes += take.length;
    }
    if (this.plainText) this.checkText(chunk, true);
    done(null, chunk);
  }

  override _flush(done: TransformCallback): void {
    if (this.plainText) this.checkText(new Uint8Array(0), false);
    done();
  }

  private checkText(chunk: Uint8Array, more: boolean): void {
    if (chunk.includes(0)) {
      this.plainText = false;
      return;
    }
    try {
      this.decoder.decode(chunk, { stream: more });
    } catch {
      this.plainText = false;
    }
  }

  private digest: string | null = null;

  /** Read once the stream has ended. */
  result(): SniffResult & { sha256: string } {
    this.digest ??= this.hash.digest('hex');
    return {
      head: Buffer.concat(this.headChunks),
      sizeBytes: this.sizeBytes,
      plainText: this.plainText && this.sizeBytes > 0,
      sha256: this.digest,
    };
  }
}

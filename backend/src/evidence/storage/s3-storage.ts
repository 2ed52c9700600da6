import {
  AbortMultipartUploadCommand,
  CompleteMultipartUploadCommand,
  CopyObjectCommand,
  CreateMultipartUploadCommand,
  DeleteObjectCommand,
  GetObjectCommand,
  HeadBucketCommand,
  PutObjectCommand,
  S3Client,
  UploadPartCommand,
  type CompletedPart,
} from '@aws-sdk/client-s3';
import { randomUUID } from 'node:crypto';
import type { Readable } from 'node:stream';
import type { S3Settings } from '../evidence.config.js';
import { assertSafeKey, INCOMING_PREFIX, type EvidenceStorage, type StoredObject } from './evidence-storage.js';

// S3 wants parts of at least 5 MiB (all but the last); 8 MiB keeps memory per upload bounded.
const PART_BYTES = 8 * 1024 * 1024;

/**
 * S3-compatible object storage. Uploads stream in parts, so an upload never sits whole in
 * memory; small ones go up in one request.
 */
export class S3Storage implements EvidenceStorage {
  readonly driver = 's3' as const;
  private readonly client: S3Client;
  private readonly bucket: string;

  constructor(settings: S3Settings) {
    this.bucket = settings.bucket;
    this.client = new S3Client({
      endpoint: settings.endpoint,
      region: settings.region,
      forcePathStyle: settings.forcePathStyle,
      credentials:
        settings.accessKeyId && settings.secretAccessKey
          ? { accessKeyId: settings.accessKeyId, secretAccessKey: settings.secretAccessKey }
          : undefined,
    });
  }

  /** For a start-up warning: true when the bucket answers. */
  async reachable(): Promise<boolean> {
    try {
      await this.client.send(new HeadBucketCommand({ Bucket: this.bucket }));
      return true;
    } catch {
      return false;
    }
  }

  async writeTemp(source: Readable): Promise<string> {
    const key = `${INCOMING_PREFIX}/${randomUUID()}`;
    let uploadId: string | undefined;
    const parts: CompletedPart[] = [];
    let pending: Buffer[] = [];
    let pendingBytes = 0;
    const sendPart = async () => {
      uploadId ??= (await this.client.send(new CreateMultipartUploadCommand({ Bucket: this.bucket, Key: key })))
        .UploadId;
      const body = Buffer.concat(pending);
      pending = [];
      pendingBytes = 0;
      const partNumber = parts.length + 1;
      const res = await this.client.send(
        new UploadPartCommand({
          Bucket: this.bucket,
          Key: key,
          UploadId: uploadId,
          PartNumber: partNumber,
          Body: body,
          ContentLength: body.length,
        }),
      );
      parts.push({ ETag: res.ETag, PartNumber: partNumber });
    };
    try {
      for await (const chunk of source) {
        pending.push(chunk as Buffer);
        pendingBytes += (chunk as Buffer).length;
        if (pendingBytes >= PART_BYTES) await sendPart();
      }
      if (!uploadId) {
        const body = Buffer.concat(pending);
        await this.client.send(
          new PutObjectCommand({ Bucket: this.bucket, Key: key, Body: body, ContentLength: body.length }),
        );
        return key;
      }
      if (pendingBytes > 0) await sendPart();
      await this.client.send(
        new CompleteMultipartUploadCommand({
          Bucket: this.bucket,
          Key: key,
          UploadId: uploadId,
          MultipartUpload: { Parts: parts },
        }),
      );
      return key;
    } catch (err) {
      if (uploadId)
        await this.client
          .send(new AbortMultipartUploadCommand({ Bucket: this.bucket, Key: key, UploadId: uploadId }))
          .catch(() => undefined);
      throw err;
    }
  }

  async commit(tempKey: string, key: string, contentType: string): Promise<void> {
    assertSafeKey(tempKey);
    assertSafeKey(key);
    await this.client.send(
      new CopyObjectCommand({
        Bucket: this.bucket,
        Key: key,
        CopySource: `${this.bucket}/${tempKey}`,
        ContentType: contentType,
        MetadataDirective: 'REPLACE',
      }),
    );
    await this.discard(tempKey);
  }

  async discard(tempKey: string): Promise<void> {
    assertSafeKey(tempKey);
    await this.client.send(new DeleteObjectCommand({ Bucket: this.bucket, Key: tempKey })).catch(() => undefined);
  }

  async put(key: string, body: Buffer, contentType: string): Promise<void> {
    assertSafeKey(key);
    await this.client.send(
      new PutObjectCommand({
        Bucket: this.bucket,
        Key: key,
        Body: body,
        ContentType: contentType,
        ContentLength: body.length,
      }),
    );
  }

  async read(key: string): Promise<StoredObject | null> {
    assertSafeKey(key);
    try {
      const res = await this.client.send(new GetObjectCommand({ Bucket: this.bucket, Key: key }));
      return { stream: res.Body as Readable, sizeBytes: Number(res.ContentLength ?? 0) };
    } catch (err) {
      const name = (err as { name?: string }).name;
      if (name === 'NoSuchKey' || name === 'NotFound') return null;
      throw err;
    }
  }

  async remove(key: string): Promise<void> {
    assertSafeKey(key);
    await this.client.send(new DeleteObjectCommand({ Bucket: this.bucket, Key: key }));
  }

  destroy(): void {
    this.client.destroy();
  }
}

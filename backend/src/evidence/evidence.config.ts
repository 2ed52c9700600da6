import { existsSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

export const EVIDENCE_CONFIG = Symbol('EVIDENCE_CONFIG');

const DEFAULT_MAX_BYTES = 25 * 1024 * 1024;

export interface S3Settings {
  endpoint: string | undefined;
  bucket: string;
  region: string;
  accessKeyId: string | undefined;
  secretAccessKey: string | undefined;
  forcePathStyle: boolean;
}

export interface EvidenceConfig {
  driver: 'disk' | 's3';
  /** Folder of the disk driver: $RAILWRIGHT_DATA/evidence. */
  diskRoot: string;
  s3: S3Settings | null;
  maxBytes: number;
}

/** The clone's top folder, for the same `.data/` default as the start script. */
function repoRoot(): string {
  let dir = path.dirname(fileURLToPath(import.meta.url));
  for (let i = 0; i < 10; i++) {
    if (existsSync(path.join(dir, 'backend', 'package.json')) && existsSync(path.join(dir, 'frontend'))) return dir;
    dir = path.dirname(dir);
  }
  return process.cwd();
}

/**
 * Storage settings, read when the app is made (not cached) so a test can start apps with
 * different drivers and limits. A bad value stops the boot with a message naming the variable.
 */
export function loadEvidenceConfig(env: NodeJS.ProcessEnv = process.env): EvidenceConfig {
  const problems: string[] = [];
  const driverName = (env.RAILWRIGHT_STORAGE ?? 'disk').trim().toLowerCase();
  if (driverName !== 'disk' && driverName !== 's3') problems.push('RAILWRIGHT_STORAGE must be disk or s3');
  const maxBytes = env.EVIDENCE_MAX_BYTES ? Number(env.EVIDENCE_MAX_BYTES) : DEFAULT_MAX_BYTES;
  if (!Number.isInteger(maxBytes) || maxBytes < 1)
    problems.push('EVIDENCE_MAX_BYTES must be a whole number of bytes, 1 or more');
  let s3: S3Settings | null = null;
  if (driverName === 's3') {
    const bucket = env.S3_BUCKET?.trim() ?? '';
    if (!bucket) problems.push('S3_BUCKET is needed when RAILWRIGHT_STORAGE=s3');
    const endpoint = env.S3_ENDPOINT?.trim() || undefined;
    if (endpoint && !/^https?:\/\//.test(endpoint)) problems.push('S3_ENDPOINT must be an http:// or https:// URL');
    const keyId = env.S3_ACCESS_KEY_ID || undefined;
    const secret = env.S3_SECRET_ACCESS_KEY || undefined;
    if (!!keyId !== !!secret)
      problems.push('S3_ACCESS_KEY_ID and S3_SECRET_ACCESS_KEY go together: set both or neither');
    const pathStyle = env.S3_FORCE_PATH_STYLE;
    if (pathStyle !== undefined && pathStyle !== 'true' && pathStyle !== 'false')
      problems.push('S3_FORCE_PATH_STYLE must be true or false');
    s3 = {
      endpoint,
      bucket,
      region: env.S3_REGION?.trim() || 'us-east-1',
      accessKeyId: keyId,
      secretAccessKey: secret,
      // Self-hosted S3-compatible servers mostly want path-style addressing.
      forcePathStyle: pathStyle === undefined ? !!endpoint : pathStyle === 'true',
    };
  }
  if (problems.length) throw new Error('Configuration: ' + problems.join('; '));
  const data = env.RAILWRIGHT_DATA ? path.resolve(env.RAILWRIGHT_DATA) : path.join(repoRoot(), '.data');
  return { driver: driverName as 'disk' | 's3', diskRoot: path.join(data, 'evidence'), s3, maxBytes };
}

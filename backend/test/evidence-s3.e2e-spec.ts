import { DeleteObjectCommand, ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';
import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import S3rver from 's3rver';
import { evidenceApiCases, type DriverHarness } from './evidence-cases.js';
import { evidenceSizeLimitCases } from './evidence-refusal-cases.js';

// The S3 driver against a fake S3 server on 127.0.0.1, started and stopped by this spec.
const BUCKET = 'railwright-evidence-test';
const KEYS = { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' };
const dir = mkdtempSync(path.join(os.tmpdir(), 'railwright-evidence-s3-'));
process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED = 'true';

let server: S3rver;
let endpoint = '';
let client: S3Client;

beforeAll(async () => {
  server = new S3rver({
    address: '127.0.0.1',
    port: 0,
    silent: true,
    directory: dir,
    configureBuckets: [{ name: BUCKET, configs: [] }],
  });
  const info = await server.run();
  endpoint = `http://127.0.0.1:${info.port}`;
  client = new S3Client({ endpoint, region: 'us-east-1', forcePathStyle: true, credentials: KEYS });
});
afterAll(async () => {
  client?.destroy();
  await server?.close();
  rmSync(dir, { recursive: true, force: true });
});

async function listAll(): Promise<string[]> {
  const keys: string[] = [];
  let token: string | undefined;
  do {
    const page = await client.send(new ListObjectsV2Command({ Bucket: BUCKET, ContinuationToken: token }));
    keys.push(...(page.Contents ?? []).map((o) => o.Key!));
    token = page.IsTruncated ? page.NextContinuationToken : undefined;
  } while (token);
  return keys.sort();
}

const harness: DriverHarness = {
  env: () => ({
    RAILWRIGHT_STORAGE: 's3',
    S3_ENDPOINT: endpoint,
    S3_BUCKET: BUCKET,
    S3_REGION: 'us-east-1',
    S3_ACCESS_KEY_ID: KEYS.accessKeyId,
    S3_SECRET_ACCESS_KEY: KEYS.secretAccessKey,
    S3_FORCE_PATH_STYLE: 'true',
    // A data folder that must stay empty: S3 holds everything.
    RAILWRIGHT_DATA: path.join(dir, 'data'),
  }),
  storedKeys: listAll,
  removeKey: async (key) => {
    await client.send(new DeleteObjectCommand({ Bucket: BUCKET, Key: key }));
  },
};

describe('evidence API on the S3 driver', () => {
  evidenceApiCases('s3', harness);

  it('keeps the objects in the bucket, not on disk', async () => {
    const keys = await listAll();
    expect(keys.length).toBeGreaterThan(0);
    expect(keys.every((k) => /^[0-9a-f-]{36}\/[0-9a-f-]{36}\/[0-9a-f-]{36}(\.thumb\.webp)?$/.test(k))).toBe(true);
  });
});

describe('evidence size limit on the S3 driver', () => {
  evidenceSizeLimitCases(harness);
});

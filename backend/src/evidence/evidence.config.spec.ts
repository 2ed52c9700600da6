import path from 'node:path';
import { loadEvidenceConfig } from './evidence.config.js';

describe('loadEvidenceConfig', () => {
  it('defaults to the disk under the data folder and 25 MB a file', () => {
    const config = loadEvidenceConfig({ RAILWRIGHT_DATA: '/srv/railwright' });
    expect(config).toMatchObject({
      driver: 'disk',
      diskRoot: path.join('/srv/railwright', 'evidence'),
      s3: null,
      maxBytes: 25 * 1024 * 1024,
    });
  });

  it('reads the S3 settings, with path-style addressing for a self-hosted endpoint', () => {
    const config = loadEvidenceConfig({
      RAILWRIGHT_STORAGE: 's3',
      S3_BUCKET: 'shop-evidence',
      S3_ENDPOINT: 'http://127.0.0.1:9000',
      S3_ACCESS_KEY_ID: 'a',
      S3_SECRET_ACCESS_KEY: 'b',
      EVIDENCE_MAX_BYTES: '1048576',
    });
    expect(config.driver).toBe('s3');
    expect(config.maxBytes).toBe(1048576);
    expect(config.s3).toEqual({
      endpoint: 'http://127.0.0.1:9000',
      bucket: 'shop-evidence',
      region: 'us-east-1',
      accessKeyId: 'a',
      secretAccessKey: 'b',
      forcePathStyle: true,
    });
    expect(loadEvidenceConfig({ RAILWRIGHT_STORAGE: 's3', S3_BUCKET: 'x-bucket' }).s3?.forcePathStyle).toBe(false);
    expect(
      loadEvidenceConfig({
        RAILWRIGHT_STORAGE: 'S3',
        S3_BUCKET: 'x-bucket',
        S3_ENDPOINT: 'https://s3.example.com',
        S3_FORCE_PATH_STYLE: 'false',
      }).s3?.forcePathStyle,
    ).toBe(false);
  });

  it.each([
    [{ RAILWRIGHT_STORAGE: 'ftp' }, /RAILWRIGHT_STORAGE must be disk or s3/],
    [{ EVIDENCE_MAX_BYTES: '25MB' }, /EVIDENCE_MAX_BYTES must be a whole number/],
    [{ EVIDENCE_MAX_BYTES: '0' }, /EVIDENCE_MAX_BYTES must be a whole number/],
    [{ RAILWRIGHT_STORAGE: 's3' }, /S3_BUCKET is needed/],
    [{ RAILWRIGHT_STORAGE: 's3', S3_BUCKET: 'b-bucket', S3_ENDPOINT: 'minio:9000' }, /S3_ENDPOINT must be an http/],
    [{ RAILWRIGHT_STORAGE: 's3', S3_BUCKET: 'b-bucket', S3_ACCESS_KEY_ID: 'only-one' }, /set both or neither/],
    [
      { RAILWRIGHT_STORAGE: 's3', S3_BUCKET: 'b-bucket', S3_FORCE_PATH_STYLE: 'yes' },
      /S3_FORCE_PATH_STYLE must be true or false/,
    ],
  ])('stops the boot on %j with a message naming the setting', (env, message) => {
    expect(() => loadEvidenceConfig(env)).toThrow(message);
  });
});

import { execFileSync } from 'node:child_process';
import { createHash, createPublicKey, verify } from 'node:crypto';
import { mkdtempSync, readFileSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { loadOrCreateKey, signingKeyPath, SigningKeyService } from './signing-key.service.js';

describe('the signing key', () => {
  let dir: string;
  const saved = { data: process.env.RAILWRIGHT_DATA, file: process.env.SIGNING_KEY_FILE };
  beforeEach(() => {
    dir = mkdtempSync(path.join(tmpdir(), 'rw-key-'));
  });
  afterEach(() => {
    rmSync(dir, { recursive: true, force: true });
    process.env.RAILWRIGHT_DATA = saved.data;
    process.env.SIGNING_KEY_FILE = saved.file;
    if (saved.data === undefined) delete process.env.RAILWRIGHT_DATA;
    if (saved.file === undefined) delete process.env.SIGNING_KEY_FILE;
  });

  it('lives in the data folder unless SIGNING_KEY_FILE names another file', () => {
    expect(signingKeyPath({ RAILWRIGHT_DATA: '/srv/rw' })).toBe('/srv/rw/signing-key.pem');
    expect(signingKeyPath({ RAILWRIGHT_DATA: '/srv/rw', SIGNING_KEY_FILE: '/etc/rw/key.pem' })).toBe('/etc/rw/key.pem');
  });

  it('is made once as an Ed25519 key readable only by its owner (mode 600), then reused', () => {
    const file = path.join(dir, 'nested', 'signing-key.pem');
    const first = loadOrCreateKey(file);
    expect(first.created).toBe(true);
    expect(first.key.asymmetricKeyType).toBe('ed25519');
    expect(statSync(file).mode & 0o777).toBe(0o600);
    const again = loadOrCreateKey(file);
    expect(again.created).toBe(false);
    expect(again.key.export({ type: 'pkcs8', format: 'pem' })).toBe(readFileSync(file, 'utf8'));
  });

  it('publishes its public key with an id that is the SHA-256 of its DER form, and its signatures check with node:crypto', () => {
    process.env.SIGNING_KEY_FILE = path.join(dir, 'k.pem');
    const key = new SigningKeyService();
    key.onModuleInit();
    // Outside check: OpenSSL's own DER encoding of the published public key, hashed with SHA-256.
    const der = execFileSync('openssl', ['pkey', '-pubin', '-outform', 'DER'], { input: key.publicKeyPem });
    expect(key.keyId).toBe(createHash('sha256').update(der).digest('hex'));
    const signature = key.sign('{"a":1}');
    expect(
      verify(null, Buffer.from('{"a":1}'), createPublicKey(key.publicKeyPem), Buffer.from(signature, 'base64')),
    ).toBe(true);
    expect(key.verify('{"a":2}', signature)).toBe(false);
    expect(key.verify('{"a":1}', 'not a signature')).toBe(false);
  });

  it('two instances sharing the file use one key', () => {
    process.env.SIGNING_KEY_FILE = path.join(dir, 'shared.pem');
    const a = new SigningKeyService();
    const b = new SigningKeyService();
    a.onModuleInit();
    b.onModuleInit();
    expect(b.keyId).toBe(a.keyId);
    expect(b.verify('x', a.sign('x'))).toBe(true);
  });
});

import { Injectable, Logger, OnModuleInit } from '@nestjs/common';
import {
  createHash,
  createPrivateKey,
  createPublicKey,
  generateKeyPairSync,
  sign,
  verify,
  type KeyObject,
} from 'node:crypto';
import { existsSync, linkSync, mkdirSync, readFileSync, statSync, unlinkSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

export const SIGNING_ALGORITHM = 'Ed25519' as const;

/** SIGNING_KEY_FILE, else signing-key.pem in the data folder ($RAILWRIGHT_DATA, or .data/ in the clone). */
export function signingKeyPath(env: NodeJS.ProcessEnv = process.env): string {
  if (env.SIGNING_KEY_FILE) return path.resolve(env.SIGNING_KEY_FILE);
  return path.join(
    env.RAILWRIGHT_DATA ? path.resolve(env.RAILWRIGHT_DATA) : path.join(cloneRoot(), '.data'),
    'signing-key.pem',
  );
}

function cloneRoot(): string {
  let dir = path.dirname(fileURLToPath(import.meta.url));
  for (let i = 0; i < 10; i++) {
    if (existsSync(path.join(dir, 'backend', 'package.json')) && existsSync(path.join(dir, 'frontend'))) return dir;
    dir = path.dirname(dir);
  }
  return process.cwd();
}

/**
 * Reads the server's Ed25519 private key, or makes it on first start. The new key is written
 * to a private temporary file and then hard-linked into place, which fails if another instance
 * got there first: then that instance's key is used, so instances sharing the file share one key.
 */
export function loadOrCreateKey(file: string): { key: KeyObject; created: boolean } {
  try {
    return { key: createPrivateKey(readFileSync(file, 'utf8')), created: false };
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code !== 'ENOENT')
      throw new Error(`The signing key ${file} cannot be read: ${(err as Error).message}`, { cause: err });
  }
  mkdirSync(path.dirname(file), { recursive: true, mode: 0o700 });
  const { privateKey } = generateKeyPairSync('ed25519');
  const temp = `${file}.${process.pid}.${Date.now()}.tmp`;
  writeFileSync(temp, privateKey.export({ type: 'pkcs8', format: 'pem' }), { mode: 0o600, flag: 'wx' });
  try {
    linkSync(temp, file);
    return { key: privateKey, created: true };
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code !== 'EEXIST') throw err;
    return { key: createPrivateKey(readFileSync(file, 'utf8')), created: false };
  } finally {
    unlinkSync(temp);
  }
}

/** The server's signing key: signs approvals and checks signatures; its public half is published. */
@Injectable()
export class SigningKeyService implements OnModuleInit {
  private readonly logger = new Logger(SigningKeyService.name);
  private privateKey: KeyObject;
  private publicKey: KeyObject;
  /** SHA-256 (hex) of the public key's DER (SubjectPublicKeyInfo) encoding. */
  keyId: string;
  publicKeyPem: string;

  onModuleInit() {
    const file = signingKeyPath();
    const { key, created } = loadOrCreateKey(file);
    if (key.asymmetricKeyType !== 'ed25519') throw new Error(`The signing key ${file} is not an Ed25519 key`);
    if (created) this.logger.log(`Made the approval signing key ${file}`);
    else if ((statSync(file).mode & 0o077) !== 0)
      this.logger.warn(`The signing key ${file} can be read by others than its owner: chmod 600 it`);
    this.privateKey = key;
    this.publicKey = createPublicKey(key);
    this.publicKeyPem = this.publicKey.export({ type: 'spki', format: 'pem' }).toString();
    this.keyId = createHash('sha256')
      .update(this.publicKey.export({ type: 'spki', format: 'der' }))
      .digest('hex');
  }

  /** Base64 Ed25519 signature of the text's UTF-8 bytes. */
  sign(text: string): string {
    return sign(null, Buffer.from(text, 'utf8'), this.privateKey).toString('base64');
  }

  verify(text: string, signatureBase64: string): boolean {
    try {
      return verify(null, Buffer.from(text, 'utf8'), this.publicKey, Buffer.from(signatureBase64, 'base64'));
    } catch {
      return false;
    }
  }
}

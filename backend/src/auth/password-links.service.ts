import { GoneException, Injectable, NotFoundException } from '@nestjs/common';
import { createHash, randomBytes } from 'node:crypto';
import { loadConfig } from '../config/config.js';
import { hashPassword } from './password.js';
import { PasswordLinksRepository } from './password-links.repository.js';

export const LINK_HOURS = 72;

const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');

/** Set-your-password links: single use, expiring, only their hash stored. */
@Injectable()
export class PasswordLinksService {
  constructor(private readonly repo: PasswordLinksRepository) {}

  /** A new link for the person; the token itself is returned once and never stored. */
  async create(userId: string, purpose: 'invitation' | 'reset' = 'invitation'): Promise<{ url: string; expiresAt: Date }> {
    const token = randomBytes(32).toString('base64url');
    const expiresAt = new Date(Date.now() + LINK_HOURS * 3600_000);
    await this.repo.insert({ userId, tokenHash: hashToken(token), purpose, expiresAt });
    return { url: `${loadConfig().appUrl}/set-password?token=${token}`, expiresAt };
  }

  /** Whom the link is for, so the page can greet them; 404 unknown, 410 used or expired. */
  async inspect(token: string) {
    const found = await this.usable(token);
    return { email: found.email, name: found.name, workshop: found.workshopName, expiresAt: found.link.expiresAt.toISOString() };
  }

  async setPassword(token: string, password: string): Promise<{ email: string }> {
    const found = await this.usable(token);
    const ok = await this.repo.consume(found.link.id, found.link.userId, await hashPassword(password));
    if (!ok) throw new GoneException('This link has already been used. Sign in, or ask an admin for a new link.');
    return { email: found.email };
  }

  private async usable(token: string) {
    const found = await this.repo.findByHash(hashToken(token));
    if (!found || !found.active) throw new NotFoundException('This link is not valid. Ask an admin of your workshop for a new one.');
    if (found.link.usedAt) throw new GoneException('This link has already been used. Sign in, or ask an admin for a new link.');
    if (found.link.expiresAt.getTime() <= Date.now()) throw new GoneException(`This link has expired (links work for ${LINK_HOURS} hours). Ask an admin for a new one.`);
    return found;
  }
}

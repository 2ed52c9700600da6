import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { expect } from '@playwright/test';

// The server under test writes each caught message into its data folder (see playwright.config.ts).
const dropFolder = () =>
  path.join(process.env.RAILWRIGHT_DATA ?? path.resolve(__dirname, '../../.test-data/e2e'), 'mail');

/** The set-password link of the newest message to `email` (whose subject matches `subject`, when given) in the local mail drop. */
export async function linkMailedTo(email: string, subject?: RegExp): Promise<string> {
  let link: string | null = null;
  await expect
    .poll(() => {
      let files: string[];
      try {
        files = readdirSync(dropFolder()).sort().reverse();
      } catch {
        return null;
      }
      for (const f of files) {
        const raw = readFileSync(path.join(dropFolder(), f), 'utf8');
        if (!raw.toLowerCase().includes(email.toLowerCase())) continue;
        if (subject && !subject.test(/^subject:(.*)$/im.exec(raw)?.[1] ?? '')) continue;
        const unfolded = bodyText(raw);
        link = /(https?:\/\/\S*?\/set-password\?token=[A-Za-z0-9_-]+)/.exec(unfolded)?.[1] ?? null;
        if (link) return link;
      }
      return null;
    })
    .not.toBeNull();
  return new URL(link!).pathname + new URL(link!).search;
}

/** The text of a single-part message as the fake server stored it (base64 or quoted-printable). */
function bodyText(raw: string): string {
  const split = raw.search(/\r?\n\r?\n/);
  const headers = raw.slice(0, split);
  const body = raw.slice(split).trim();
  if (/content-transfer-encoding:\s*base64/i.test(headers))
    return Buffer.from(body.replace(/\s+/g, ''), 'base64').toString('utf8');
  return body.replace(/=\r?\n/g, '').replace(/=3D/g, '=');
}

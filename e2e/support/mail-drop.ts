import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { expect } from '@playwright/test';

// The server under test writes each caught message into its data folder (see playwright.config.ts).
const dropFolder = () => path.join(process.env.RAILWRIGHT_DATA ?? path.resolve(__dirname, '../../.test-data/e2e'), 'mail');

/** The set-password link of the newest message to `email` in the local mail drop. */
export async function linkMailedTo(email: string): Promise<string> {
  let link: string | null = null;
  await expect
    .poll(() => {
      let files: string[] = [];
      try {
        files = readdirSync(dropFolder()).sort().reverse();
      } catch {
        return null;
      }
      for (const f of files) {
        const raw = readFileSync(path.join(dropFolder(), f), 'utf8');
        if (!raw.toLowerCase().includes(email.toLowerCase())) continue;
        const unfolded = raw.replace(/=\r?\n/g, '').replace(/=3D/g, '=');
        link = /(https?:\/\/\S*?\/set-password\?token=[A-Za-z0-9_-]+)/.exec(unfolded)?.[1] ?? null;
        if (link) return link;
      }
      return null;
    })
    .not.toBeNull();
  return new URL(link!).pathname + new URL(link!).search;
}

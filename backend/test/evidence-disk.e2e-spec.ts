import { mkdtempSync, rmSync } from 'node:fs';
import { readdir, rm } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { evidenceApiCases, type DriverHarness } from './evidence-cases.js';
import { evidenceSizeLimitCases } from './evidence-refusal-cases.js';

// The disk driver under a data folder of this spec's own, so "nothing left behind" is exact.
const data = mkdtempSync(path.join(os.tmpdir(), 'railwright-evidence-disk-'));
const root = path.join(data, 'evidence');

async function walk(dir: string, prefix = ''): Promise<string[]> {
  const entries = await readdir(dir, { withFileTypes: true }).catch(() => []);
  const out: string[] = [];
  for (const e of entries) {
    const rel = prefix ? `${prefix}/${e.name}` : e.name;
    if (e.isDirectory()) out.push(...(await walk(path.join(dir, e.name), rel)));
    else out.push(rel);
  }
  return out.sort();
}

const harness: DriverHarness = {
  env: () => ({ RAILWRIGHT_STORAGE: 'disk', RAILWRIGHT_DATA: data }),
  storedKeys: () => walk(root),
  removeKey: (key) => rm(path.join(root, ...key.split('/'))),
};

afterAll(() => rmSync(data, { recursive: true, force: true }));

describe('evidence API on the disk driver', () => {
  evidenceApiCases('disk', harness);

  it('keeps the files under the data folder', async () => {
    const keys = await harness.storedKeys();
    expect(keys.length).toBeGreaterThan(0);
    expect(keys.every((k) => /^[0-9a-f-]{36}\/[0-9a-f-]{36}\/[0-9a-f-]{36}(\.thumb\.webp)?$/.test(k))).toBe(true);
  });
});

describe('evidence size limit on the disk driver', () => {
  evidenceSizeLimitCases(harness);
});

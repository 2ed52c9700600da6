import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { brotliCompressSync, constants as zlib } from 'node:zlib';
import type { BenchRow } from './bench-types.js';

/**
 * The page's weight: for the sign-in page, the machines list and the machine file, the brotli
 * bytes of JavaScript and CSS a first visit has to load before the page can draw. Read from the
 * built frontend (Vite's manifest): the entry and everything it imports statically, plus the
 * route's own chunk (and the machine file's first tab) with their static imports. Fonts, images
 * and data are left out; what a later click loads on demand is left out too.
 */

interface ManifestChunk {
  file: string;
  src?: string;
  isEntry?: boolean;
  imports?: string[];
  css?: string[];
}
type Manifest = Record<string, ManifestChunk>;

interface Page {
  name: string;
  /** Source modules loaded on demand when this page opens (manifest keys), besides the entry. */
  modules: string[];
  goalKb: number;
}

/** The page goals: the sign-in page ≤ 150 KB and the machine file ≤ 350 KB of compressed JS and CSS. */
const SIGNED_IN = 'src/app/routes/signed-in-layout.tsx';
export const PAGES: Page[] = [
  { name: 'sign-in page', modules: [], goalKb: 150 },
  { name: 'machines list', modules: [SIGNED_IN, 'src/app/routes/machines.tsx'], goalKb: 350 },
  {
    name: 'machine file (readiness tab)',
    modules: [SIGNED_IN, 'src/app/routes/machine-file.tsx', 'src/features/approvals/components/readiness-board.tsx'],
    goalKb: 350,
  },
];

/** frontend/dist, or FRONTEND_DIST when the build lives elsewhere (a private build). */
export function frontendDist(): string {
  if (process.env.FRONTEND_DIST) return process.env.FRONTEND_DIST;
  let dir = path.dirname(fileURLToPath(import.meta.url));
  while (dir !== path.dirname(dir)) {
    if (existsSync(path.join(dir, 'frontend', 'package.json'))) return path.join(dir, 'frontend', 'dist');
    dir = path.dirname(dir);
  }
  throw new Error('frontend-sizes: cannot find the frontend folder; set FRONTEND_DIST');
}

export function readManifest(dist: string): Manifest {
  const file = path.join(dist, '.vite', 'manifest.json');
  if (!existsSync(file))
    throw new Error(`frontend-sizes: ${file} is missing; build the frontend first (npm run build -w frontend)`);
  return JSON.parse(readFileSync(file, 'utf8')) as Manifest;
}

/** Every JS and CSS file a set of manifest keys needs, following static imports only. */
export function filesFor(manifest: Manifest, keys: string[]): Set<string> {
  const files = new Set<string>();
  const seen = new Set<string>();
  const visit = (key: string) => {
    if (seen.has(key)) return;
    seen.add(key);
    const chunk = manifest[key];
    if (!chunk) throw new Error(`frontend-sizes: ${key} is not in the build's manifest (was the route renamed?)`);
    files.add(chunk.file);
    chunk.css?.forEach((c) => files.add(c));
    chunk.imports?.forEach(visit);
  };
  keys.forEach(visit);
  return files;
}

/** The .br file written at build when there is one, else the file compressed here at the same level. */
function brotliBytes(dist: string, file: string): number {
  const full = path.join(dist, file);
  if (existsSync(`${full}.br`)) return readFileSync(`${full}.br`).length;
  return brotliCompressSync(readFileSync(full), { params: { [zlib.BROTLI_PARAM_QUALITY]: 11 } }).length;
}

export interface PageWeight {
  name: string;
  files: string[];
  rawBytes: number;
  brotliBytes: number;
  goalKb: number;
}

export function pageWeights(dist = frontendDist()): PageWeight[] {
  const manifest = readManifest(dist);
  const entry = Object.keys(manifest).filter((k) => manifest[k].isEntry);
  if (entry.length === 0) throw new Error('frontend-sizes: the manifest names no entry');
  return PAGES.map((page) => {
    const files = [...filesFor(manifest, [...entry, ...page.modules])].filter(
      (f) => f.endsWith('.js') || f.endsWith('.css'),
    );
    return {
      name: page.name,
      files,
      rawBytes: files.reduce((sum, f) => sum + readFileSync(path.join(dist, f)).length, 0),
      brotliBytes: files.reduce((sum, f) => sum + brotliBytes(dist, f), 0),
      goalKb: page.goalKb,
    };
  });
}

export async function frontendSizes(): Promise<BenchRow[]> {
  return pageWeights().map((p) => {
    const kb = Math.round((p.brotliBytes / 1024) * 10) / 10;
    return {
      name: `${p.name}: JS + CSS to load (brotli; ${Math.round(p.rawBytes / 1024)} KB uncompressed, ${p.files.length} files)`,
      value: kb,
      unit: 'KB',
      goal: `≤ ${p.goalKb} KB`,
      met: kb <= p.goalKb,
    };
  });
}

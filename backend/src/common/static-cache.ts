import path from 'node:path';

/** @fastify/static hands over the Fastify reply. */
interface HeaderTarget {
  header(name: string, value: string): unknown;
}

/**
 * Built files under /assets carry a content hash in their names, so they never change: cached for
 * a year as immutable. index.html names the current hashes, so it is revalidated on every visit.
 */
export function staticCacheHeaders(reply: HeaderTarget, filePath: string): void {
  // A precompressed copy (index.html.br) is cached like the file it stands for.
  const rel = filePath
    .split(path.sep)
    .join('/')
    .replace(/\.(br|gz)$/, '');
  if (rel.includes('/assets/')) reply.header('cache-control', 'public, max-age=31536000, immutable');
  else if (rel.endsWith('/index.html')) reply.header('cache-control', 'no-cache');
  else reply.header('cache-control', 'public, max-age=3600');
}

import { staticCacheHeaders } from './static-cache.js';

const headerFor = (file: string) => {
  const set: Record<string, string> = {};
  staticCacheHeaders({ header: (n: string, v: string) => (set[n] = v) }, file);
  return set['cache-control'];
};

describe('cache headers of the built app', () => {
  it('keeps hashed assets a year, plain or precompressed', () => {
    for (const f of [
      '/srv/dist/assets/index-abc123.js',
      '/srv/dist/assets/index-abc123.js.br',
      '/srv/dist/assets/index-abc123.css.gz',
    ]) {
      expect(headerFor(f)).toBe('public, max-age=31536000, immutable');
    }
  });

  it('revalidates index.html, plain or precompressed', () => {
    for (const f of ['/srv/dist/index.html', '/srv/dist/index.html.br', '/srv/dist/index.html.gz'])
      expect(headerFor(f)).toBe('no-cache');
  });
});

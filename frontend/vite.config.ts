import path from 'node:path';
import { constants } from 'node:zlib';
import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import { compression, defineAlgorithm } from 'vite-plugin-compression2';
import { VitePWA } from 'vite-plugin-pwa';

// The first screens' code, each in one file instead of dozens of small ones: a browser asks a
// server for six files at a time, so 50 small files cost several round trips where 3 cost one.
// The entry's code (all the sign-in page loads) stays one file of its own; every other module
// goes to the first screen below that reaches it by static imports (none: split as usual).
const FIRST_SCREENS: [string, string][] = [
  ['signed-in', 'src/app/routes/signed-in-layout.tsx'],
  ['machine-file', 'src/app/routes/machine-file.tsx'],
];
type ChunkingContext = { getModuleInfo(id: string): { importedIds: readonly string[] } | null };
const screensOfBuild = new WeakMap<ChunkingContext, Map<string, string>>();
function firstScreenOf(id: string, ctx: ChunkingContext): string | null {
  let screens = screensOfBuild.get(ctx);
  if (!screens) {
    screens = new Map();
    for (const [name, root] of FIRST_SCREENS) {
      const todo = [path.join(import.meta.dirname, root)];
      for (let m = todo.pop(); m !== undefined; m = todo.pop()) {
        if (screens.has(m)) continue;
        screens.set(m, name);
        todo.push(...(ctx.getModuleInfo(m)?.importedIds ?? []));
      }
    }
    screensOfBuild.set(ctx, screens);
  }
  return screens.get(id) ?? null;
}
const CHUNK_GROUPS = [
  { name: 'entry', tags: ['$initial' as const], priority: 1, includeDependenciesRecursively: false },
  { name: firstScreenOf, includeDependenciesRecursively: false },
];

export default defineConfig({
  plugins: [
    react(),
    // The app opens without a connection after one visit: a service worker keeps the built files
    // (precached, replaced whole when a new build is served) and answers every page address with
    // index.html. API answers are not cached here: the app keeps its data in IndexedDB itself.
    VitePWA({
      registerType: 'autoUpdate',
      injectRegister: null,
      manifest: {
        name: 'Railwright',
        short_name: 'Railwright',
        description: 'Commissioning and calibration log for gantry machines',
        theme_color: '#1d4f4a',
        background_color: '#f4f2ec',
        display: 'standalone',
        start_url: '/',
        icons: [{ src: '/railwright.svg', sizes: 'any', type: 'image/svg+xml', purpose: 'any' }],
      },
      workbox: {
        globPatterns: ['**/*.{js,css,html,svg,woff,woff2,png,webmanifest}'],
        navigateFallback: '/index.html',
        navigateFallbackDenylist: [/^\/api\//],
        cleanupOutdatedCaches: true,
        maximumFileSizeToCacheInBytes: 3 * 1024 * 1024,
      },
    }),
    // Brotli and gzip copies beside each built file, served as they are by the server
    // (@fastify/static preCompressed): the best compression at build, none at request time.
    compression({
      algorithms: [
        defineAlgorithm('brotliCompress', { params: { [constants.BROTLI_PARAM_QUALITY]: 11 } }),
        defineAlgorithm('gzip', { level: 9 }),
      ],
      // index.html is left plain: it is tiny and its no-cache header is set by its own name.
      include: /\.(js|css|svg|json|txt)$/,
      exclude: /\.vite\//,
      threshold: 1024,
      skipIfLargerOrEqual: true,
    }),
  ],
  server: {
    host: '127.0.0.1',
    port: 5173,
    proxy: { '/api': `http://127.0.0.1:${process.env.PORT ?? 3000}` },
  },
  // The manifest lets the bench count what each page loads (backend/bench/server/frontend-sizes.ts).
  // Every browser the app supports preloads modules itself: no polyfill in the first download.
  build: {
    outDir: 'dist',
    sourcemap: false,
    manifest: true,
    chunkSizeWarningLimit: 600,
    modulePreload: { polyfill: false },
    rolldownOptions: { output: { codeSplitting: { groups: CHUNK_GROUPS } } },
  },
});

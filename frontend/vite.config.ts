import { constants } from 'node:zlib';
import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import { compression, defineAlgorithm } from 'vite-plugin-compression2';
import { VitePWA } from 'vite-plugin-pwa';

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
  },
});

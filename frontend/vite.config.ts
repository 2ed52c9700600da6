import { constants } from 'node:zlib';
import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import { compression, defineAlgorithm } from 'vite-plugin-compression2';

export default defineConfig({
  plugins: [
    react(),
    // Brotli and gzip copies beside each built file, served as they are by the server
    // (@fastify/static preCompressed): the best compression at build, none at request time.
    compression({
      algorithms: [defineAlgorithm('brotliCompress', { params: { [constants.BROTLI_PARAM_QUALITY]: 11 } }), defineAlgorithm('gzip', { level: 9 })],
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
  build: { outDir: 'dist', sourcemap: false, manifest: true, chunkSizeWarningLimit: 600 },
});

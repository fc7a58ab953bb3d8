import { defineConfig } from 'vitest/config';
import react from '@vitejs/plugin-react';
import type { Plugin } from 'vite';

// The dev server's React refresh preamble is an inline script; allow it in development only.
// The built app keeps the strict policy of index.html.
const devInlineScripts: Plugin = {
  name: 'foldroot-dev-csp',
  apply: 'serve',
  transformIndexHtml: (html) => html.replace("script-src 'self'", "script-src 'self' 'unsafe-inline'"),
};

// The app is served from the local machine and makes no network requests.
export default defineConfig({
  plugins: [react(), devInlineScripts],
  base: './',
  build: { target: 'es2022', sourcemap: true, chunkSizeWarningLimit: 2000 },
  worker: { format: 'es' },
  server: { port: 5173, strictPort: false },
  preview: { port: 4173, strictPort: true },
  test: {
    include: ['tests/**/*.test.ts', 'tests/**/*.test.tsx'],
    exclude: ['tests/e2e/**', 'node_modules/**'],
    environment: 'node',
    setupFiles: ['tests/setup/fastCheck.ts'],
    reporters: ['default'],
  },
});

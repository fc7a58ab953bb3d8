import { readdirSync, readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { defineConfig } from 'vitest/config';
import react from '@vitejs/plugin-react';
import type { Plugin } from 'vite';
import { PDF_STANDARD_FONTS_PATH } from './src/io/pdfStandardFonts.ts';
import { SECURITY_HEADERS } from './securityHeaders.ts';

// The dev server's React refresh preamble is an inline script; allow it in development only.
// The built app keeps the strict policy of index.html.
const devInlineScripts: Plugin = {
  name: 'foldroot-dev-csp',
  apply: 'serve',
  transformIndexHtml: (html) => html.replace("script-src 'self'", "script-src 'self' 'unsafe-inline'"),
};

// pdf.js draws text in the 14 standard PDF fonts (and fonts not embedded) from its standard font data:
// copied from the installed pdfjs-dist into the build, and served from there in development, so that
// the app fetches them from its own origin (src/io/pdfStandardFonts.ts, src/io/decodePdf.ts).
const standardFontsDir = join(dirname(createRequire(import.meta.url).resolve('pdfjs-dist/package.json')), 'standard_fonts');
const pdfStandardFonts: Plugin = {
  name: 'foldroot-pdf-standard-fonts',
  configureServer(server) {
    server.middlewares.use(`/${PDF_STANDARD_FONTS_PATH}`, (req, res) => {
      const name = decodeURIComponent((req.url ?? '').split('?')[0].replace(/^\//, ''));
      if (!readdirSync(standardFontsDir).includes(name)) {
        res.statusCode = 404;
        res.end();
        return;
      }
      res.setHeader('Content-Type', 'application/octet-stream');
      res.end(readFileSync(join(standardFontsDir, name)));
    });
  },
  generateBundle() {
    for (const name of readdirSync(standardFontsDir)) {
      this.emitFile({ type: 'asset', fileName: `${PDF_STANDARD_FONTS_PATH}${name}`, source: readFileSync(join(standardFontsDir, name)) });
    }
  },
};

// The app is served from the local machine and makes no network requests.
export default defineConfig({
  plugins: [react(), devInlineScripts, pdfStandardFonts],
  base: './',
  build: { target: 'es2022', sourcemap: true, chunkSizeWarningLimit: 2000 },
  worker: { format: 'es' },
  server: { port: 5173, strictPort: false },
  // `npm start` and the browser tests serve the build with the app's security headers (securityHeaders.ts).
  preview: { port: 4173, strictPort: true, headers: SECURITY_HEADERS },
  test: {
    include: ['tests/**/*.test.ts', 'tests/**/*.test.tsx'],
    exclude: ['tests/e2e/**', 'node_modules/**'],
    environment: 'node',
    setupFiles: ['tests/setup/fastCheck.ts'],
    reporters: ['default'],
    // A guard against a hung test, not a speed check: property tests run hundreds of cases and a shared
    // two-core machine can run them several times slower than a quiet one.
    testTimeout: 60_000,
  },
});

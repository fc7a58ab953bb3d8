import { spawn } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { PAGE_CSP, SECURITY_HEADERS } from '../../securityHeaders';

// The server of `npm start` (vite preview with this project's config) sends the security headers, framing
// refused among them; index.html's <meta> policy is the same policy. Header semantics: W3C CSP Level 3
// (frame-ancestors) and RFC 7034 (X-Frame-Options).
const root = join(import.meta.dirname, '..', '..');

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const { port } = probe.address() as { port: number };
      probe.close(() => resolve(port));
    });
  });
}

async function headersOf(url: string): Promise<Headers> {
  let last: unknown;
  for (let i = 0; i < 150; i++) {
    try {
      return (await fetch(url)).headers;
    } catch (e) {
      last = e;
      await new Promise((r) => setTimeout(r, 200));
    }
  }
  throw last;
}

describe('security headers', () => {
  it('vite preview (npm start) sends the CSP with frame-ancestors \'none\' and X-Frame-Options DENY', async () => {
    const dist = mkdtempSync(join(tmpdir(), 'foldroot-headers-'));
    writeFileSync(join(dist, 'index.html'), '<!doctype html><title>t</title>');
    const port = await freePort();
    const server = spawn(process.execPath, [join(root, 'node_modules/vite/bin/vite.js'), 'preview', '--host', '127.0.0.1', '--port', String(port), '--strictPort', '--outDir', dist], { cwd: root, stdio: 'ignore' });
    try {
      const h = await headersOf(`http://127.0.0.1:${port}/`);
      expect(h.get('content-security-policy')).toContain("frame-ancestors 'none'");
      expect(h.get('content-security-policy')).toContain("default-src 'self'");
      expect(h.get('x-frame-options')).toBe('DENY');
      expect(h.get('x-content-type-options')).toBe('nosniff');
      for (const [k, v] of Object.entries(SECURITY_HEADERS)) expect(h.get(k)).toBe(v);
    } finally {
      server.kill();
    }
  }, 60_000);

  it('index.html\'s <meta> policy is the policy the server sends', () => {
    const html = readFileSync(join(root, 'index.html'), 'utf8');
    const meta = /http-equiv="Content-Security-Policy"\s+content="([^"]+)"/.exec(html);
    expect(meta?.[1]).toBe(PAGE_CSP);
  });
});

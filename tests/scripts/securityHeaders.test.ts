import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { startPreview } from '../../scripts/previewServer';
import { PAGE_CSP, SECURITY_HEADERS } from '../../securityHeaders';

// The server of `npm start` (vite preview with this project's config) sends the security headers, framing
// refused among them; index.html's <meta> policy is the same policy. Header semantics: W3C CSP Level 3
// (frame-ancestors) and RFC 7034 (X-Frame-Options).
const root = join(import.meta.dirname, '..', '..');

describe('security headers', () => {
  it('vite preview (npm start) sends the CSP with frame-ancestors \'none\' and X-Frame-Options DENY', async () => {
    const dist = mkdtempSync(join(tmpdir(), 'foldroot-headers-'));
    writeFileSync(join(dist, 'index.html'), '<!doctype html><title>t</title>');
    const preview = await startPreview(dist);
    try {
      const h = (await fetch(`${preview.url}/`)).headers;
      expect(h.get('content-security-policy')).toContain("frame-ancestors 'none'");
      expect(h.get('content-security-policy')).toContain("default-src 'self'");
      expect(h.get('x-frame-options')).toBe('DENY');
      expect(h.get('x-content-type-options')).toBe('nosniff');
      for (const [k, v] of Object.entries(SECURITY_HEADERS)) expect(h.get(k)).toBe(v);
    } finally {
      preview.stop();
    }
  }, 60_000);

  it('index.html\'s <meta> policy is the policy the server sends', () => {
    const html = readFileSync(join(root, 'index.html'), 'utf8');
    const meta = /http-equiv="Content-Security-Policy"\s+content="([^"]+)"/.exec(html);
    expect(meta?.[1]).toBe(PAGE_CSP);
  });
});

import { readFileSync } from 'node:fs';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { HelpKeyTables } from '../../src/panels/workspace/HelpOverlay';
import { TOOLS } from '../../src/tools/toolRegistry';

// The help overlay (what the app shows on "?") and README's "Keys" table list the same keys, in the same
// order: the overlay's tables are rendered as the app renders them, README is read as a user reads it.

/** The key column of README's "### Keys" table. */
function readmeKeys(): string[] {
  const readme = readFileSync(new URL('../../README.md', import.meta.url), 'utf8');
  const start = readme.indexOf('### Keys');
  expect(start).toBeGreaterThan(0);
  const rest = readme.slice(start).split('\n');
  const rows = rest.filter((l) => /^\| `/.test(l));
  const end = rest.findIndex((l, i) => i > 0 && /^#/.test(l));
  expect(end).toBeGreaterThan(0);
  return rows.filter((l) => rest.indexOf(l) < end).map((l) => /^\| `([^`]+)` \|/.exec(l)?.[1] ?? '');
}

/** The <kbd> texts of the rendered help overlay, decoded. */
function overlayKeys(): string[] {
  const html = renderToStaticMarkup(<HelpKeyTables />);
  const decode = (t: string) => t.replace(/&amp;/g, '&').replace(/&lt;/g, '<').replace(/&gt;/g, '>').replace(/&quot;/g, '"').replace(/&#x27;/g, "'");
  return [...html.matchAll(/<kbd>([^<]*)<\/kbd>/g)].map((m) => decode(m[1]));
}

describe('README and the help overlay', () => {
  it('list the same keys in the same order', () => {
    const shown = overlayKeys();
    expect(shown.length).toBeGreaterThan(TOOLS.length);
    expect(readmeKeys()).toEqual(shown);
  });

  it('the overlay shows every tool key of the registry', () => {
    const shown = new Set(overlayKeys());
    for (const t of TOOLS) expect(shown.has(t.key.toUpperCase())).toBe(true);
  });
});

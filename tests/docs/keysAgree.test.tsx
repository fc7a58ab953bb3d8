import { readFileSync } from 'node:fs';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { HelpKeyTables } from '../../src/panels/workspace/HelpOverlay';
import { KEY_TABLE } from '../../src/state/keyTable';
import { TOOLS } from '../../src/tools/toolRegistry';

// The key table (what the one keyboard listener dispatches from), the help overlay (what the app shows on
// "?") and README's "Keys" table list the same keys, in the same order, with the same words: the overlay's
// tables are rendered as the app renders them, README is read as a user reads it.

/** README's "### Keys" table: [key, what it does] per row, with the Markdown emphasis taken off. */
function readmeRows(): [string, string][] {
  const readme = readFileSync(new URL('../../README.md', import.meta.url), 'utf8');
  const start = readme.indexOf('### Keys');
  expect(start).toBeGreaterThan(0);
  const rest = readme.slice(start).split('\n');
  const end = rest.findIndex((l, i) => i > 0 && /^#/.test(l));
  expect(end).toBeGreaterThan(0);
  return rest.slice(0, end).filter((l) => /^\| `/.test(l)).map((l) => {
    const m = /^\| `([^`]+)` \| (.*) \|$/.exec(l);
    return [m?.[1] ?? '', (m?.[2] ?? '').replace(/\*/g, '')];
  });
}

/** The rendered help overlay's rows: [key, what it does], HTML entities decoded and tags taken off. */
function overlayRows(): [string, string][] {
  const html = renderToStaticMarkup(<HelpKeyTables />);
  const decode = (t: string) => t.replace(/<[^>]+>/g, '').replace(/&amp;/g, '&').replace(/&lt;/g, '<').replace(/&gt;/g, '>').replace(/&quot;/g, '"').replace(/&#x27;/g, "'");
  return [...html.matchAll(/<tr><td><kbd>([^<]*)<\/kbd><\/td><td>(.*?)<\/td><\/tr>/g)].map((m) => [decode(m[1]), decode(m[2])]);
}

describe('README, the help overlay and the key table', () => {
  it('the overlay shows every row of the key table, in its order and words', () => {
    const shown = overlayRows();
    expect(shown.length).toBe(KEY_TABLE.length);
    // Tools first, then the rest: the order of the table as the overlay's two columns read.
    const tableOrder = [...KEY_TABLE.filter((r) => r.toolId), ...KEY_TABLE.filter((r) => !r.toolId)];
    expect(shown).toEqual(tableOrder.map((r) => [r.label, r.toolLabel ? `${r.toolLabel} — ${r.what}` : r.what]));
  });

  it('README lists the same keys in the same order; the general keys in the same words', () => {
    const readme = readmeRows();
    const shown = overlayRows();
    expect(readme.map(([k]) => k)).toEqual(shown.map(([k]) => k));
    KEY_TABLE.filter((r) => !r.toolId).forEach((r) => expect(readme).toContainEqual([r.label, r.what]));
    // A tool's row in README names the tool; its hint (long) is the overlay's.
    for (const r of KEY_TABLE.filter((row) => row.toolLabel)) {
      expect(readme.find(([k]) => k === r.label)?.[1]).toContain(`${r.toolLabel} tool`);
    }
  });

  it('the overlay shows every tool key of the registry', () => {
    const shown = new Set(overlayRows().map(([k]) => k));
    for (const t of TOOLS) expect(shown.has(t.key.toUpperCase())).toBe(true);
  });
});

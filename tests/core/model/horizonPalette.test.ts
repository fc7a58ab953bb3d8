// The colours of the section's marks and of the scenarios are written once (src/core/model/horizonPalette.ts):
// no other source file spells one of them, so the screen and the exported figures cannot drift apart.
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';
import { EXCESS_FILL, FAULT_COLOURS, HORIZON_PALETTE, MARK_COLOURS, SCENARIO_COLOURS } from '../../../src/core/model/horizonPalette';

const root = join(import.meta.dirname, '..', '..', '..');

function sources(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const p = join(dir, name);
    return statSync(p).isDirectory() ? sources(p) : /\.(ts|tsx)$/.test(name) ? [p] : [];
  });
}

describe('the one palette', () => {
  it('no source file but horizonPalette.ts writes a horizon, mark, scenario, fault or fill colour', () => {
    const colours = [...HORIZON_PALETTE, ...Object.values(MARK_COLOURS), ...SCENARIO_COLOURS, ...FAULT_COLOURS, EXCESS_FILL.above.colour, EXCESS_FILL.below.colour];
    const found: string[] = [];
    for (const f of sources(join(root, 'src'))) {
      if (f.endsWith('horizonPalette.ts')) continue;
      const text = readFileSync(f, 'utf8').toLowerCase();
      for (const c of colours) if (text.includes(c.toLowerCase())) found.push(`${relative(root, f)}: ${c}`);
    }
    expect(found).toEqual([]);
  });
});

// The key of a section: a result is kept with the key of the section it was run on, and is stale as soon as
// anything the analysis reads has changed.
import { describe, expect, it } from 'vitest';
import type { Section } from '../../../src/core/model/section';
import { sectionKey } from '../../../src/core/model/sectionKey';
import { methodExample } from '../analysis/sections';

const clone = (s: Section): Section => JSON.parse(JSON.stringify(s)) as Section;

describe('sectionKey(section)', () => {
  it('is equal for equal sections (a copy) and differs for any change the analysis reads', () => {
    const s = methodExample();
    expect(sectionKey(clone(s))).toBe(sectionKey(s));
    const changes: ((c: Section) => void)[] = [
      (c) => { c.horizons[2].regional[1][1] += 1e-9; },
      (c) => { c.horizons[0].line![1][0] += 0.5; },
      (c) => { c.horizons[1].include = false; },
      (c) => { c.pins = [0, 9999]; },
      (c) => { c.referenceElevation = 10; },
      (c) => { c.horizons[3].name = 'H4 renamed'; },
      (c) => { c.units = 'ft'; },
      (c) => { c.horizons[0].projected = [[0, 1]]; },
      (c) => { c.horizons.pop(); },
    ];
    const keys = new Set([sectionKey(s)]);
    for (const change of changes) {
      const c = clone(s);
      change(c);
      keys.add(sectionKey(c));
    }
    expect(keys.size).toBe(changes.length + 1);
  });
});

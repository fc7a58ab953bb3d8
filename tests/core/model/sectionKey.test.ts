// The key of a section: a result is kept with the key of the section it was run on, and is stale as soon as
// anything the analysis reads has changed.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import type { Section, XZ } from '../../../src/core/model/section';
import { isStale, sectionKey } from '../../../src/core/model/sectionKey';
import { methodExample } from '../analysis/sections';

// structuredClone keeps -0 and every float bit for bit (a JSON copy would write -0 as 0).
const clone = (s: Section): Section => structuredClone(s);

// An independent statement of "the same section for the analysis": the JSON text of every field the analysis
// reads, with each number written as its exact float bits (JSON would print -0 as 0 and NaN as null).
function content(s: Section): string {
  return JSON.stringify(s, (_k, v: unknown) => {
    if (typeof v !== 'number') return v;
    const f = new Float64Array([v]);
    const u = new Uint32Array(f.buffer);
    return `${u[0]}:${u[1]}`;
  });
}

/** The next float above v (one unit in the last place): the smallest change a coordinate can have. */
function nextUp(v: number): number {
  const f = new Float64Array([v]);
  const i = new BigInt64Array(f.buffer);
  i[0] += v >= 0 ? 1n : -1n;
  return v === 0 ? Number.MIN_VALUE : f[0];
}

/** Every coordinate of the section, as [get, set] pairs. */
function coordinates(s: Section): { at: string; get: () => number; set: (v: number) => void }[] {
  const out: { at: string; get: () => number; set: (v: number) => void }[] = [];
  const runs: [string, XZ[]][] = [];
  s.horizons.forEach((h, i) => {
    if (h.line) runs.push([`horizon ${i} line`, h.line]);
    h.pieces?.forEach((p, k) => runs.push([`horizon ${i} piece ${k}`, p]));
    runs.push([`horizon ${i} regional`, h.regional]);
  });
  s.faults?.forEach((f, i) => runs.push([`fault ${i}`, f.line]));
  for (const [name, run] of runs) {
    run.forEach((p, j) => [0, 1].forEach((c) => out.push({ at: `${name} vertex ${j} ${c ? 'z' : 'x'}`, get: () => p[c], set: (v) => { p[c] = v; } })));
  }
  return out;
}

const point = fc.tuple(fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.double({ min: -1e4, max: 1e4, noNaN: true })) as fc.Arbitrary<XZ>;
const run = (min: number) => fc.array(point, { minLength: min, maxLength: 12 });
const section: fc.Arbitrary<Section> = fc.record({
  units: fc.constantFrom('m' as const, 'ft' as const),
  pins: fc.tuple(fc.double({ min: -100, max: 0, noNaN: true }), fc.double({ min: 1, max: 100, noNaN: true })),
  horizons: fc.array(fc.oneof(
    fc.record({ name: fc.string({ maxLength: 6 }), line: run(2), regional: run(2) }),
    fc.record({ name: fc.string({ maxLength: 6 }), pieces: fc.array(run(2), { minLength: 2, maxLength: 3 }), regional: run(2) }),
  ), { minLength: 1, maxLength: 4 }),
  faults: fc.array(fc.record({ name: fc.string({ maxLength: 6 }), line: run(2) }), { maxLength: 2 }),
});

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
      (c) => { c.resolution = 0.25; },
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

  it('agrees with a comparison of the sections\' full content: equal content, equal key; one coordinate moved by one ulp, a new key', () => {
    // Property (fast-check): for random sections of lines, faulted pieces and faults, a copy keeps the key and
    // moving any single coordinate to the next float changes it, as the content comparison says it should.
    fc.assert(fc.property(section, fc.nat(), (s, pick) => {
      const copy = clone(s);
      expect(content(copy)).toBe(content(s));
      expect(sectionKey(copy)).toBe(sectionKey(s));
      // The key is kept per section object: the moved section is a new object, as the selectors hand out.
      const moved = clone(s);
      const coords = coordinates(moved);
      const c = coords[pick % coords.length];
      c.set(nextUp(c.get()));
      expect(content(moved)).not.toBe(content(s));
      expect(sectionKey(moved)).not.toBe(sectionKey(s));
    }), { numRuns: 300 });
  });

  it('tells a record stale when one coordinate of the last vertex of the last of 12 horizons of 100,000 vertices moves', () => {
    const n = 100_000;
    const big: Section = {
      units: 'm', pins: [0, n],
      horizons: Array.from({ length: 12 }, (_, i) => ({
        name: `H${i + 1}`,
        line: Array.from({ length: n }, (_, k): XZ => [k, 1000 - 100 * i + Math.sin(k / 500) * 50]),
        regional: [[0, 1000 - 100 * i], [n, 1000 - 100 * i]] as XZ[],
      })),
    };
    const record = { sectionKey: sectionKey(big) };
    // New section objects (the key is kept per object), sharing the lines or with the last one copied and moved.
    expect(isStale(record, { ...big, horizons: big.horizons.map((h) => ({ ...h })) })).toBe(false);
    for (const c of [0, 1]) {
      const moved: Section = { ...big, horizons: big.horizons.map((h, i) => (i === 11 ? { ...h, line: h.line!.map((p): XZ => [p[0], p[1]]) } : h)) };
      const last = moved.horizons[11].line![n - 1];
      last[c] = nextUp(last[c]);
      expect(last[c]).not.toBe(big.horizons[11].line![n - 1][c]);
      expect(isStale(record, moved)).toBe(true);
    }
  });
});

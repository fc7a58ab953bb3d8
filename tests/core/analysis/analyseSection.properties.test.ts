import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyseSection, type SectionAnalysis } from '../../../src/core/analysis/analyseSection';
import type { LineSection, Section, XZ } from '../../../src/core/model/section';
import { maxOf } from '../../../src/core/stats/minMax';

// Invariants of the analysis (DEVELOPERS.md §Code style, tests; delaunator-style scaled runs).
// Random sections: monotone-in-x horizons (no self-crossing) over inclined regionals, pins [0, 1000].

const horizonArb = fc.record({
  zs: fc.array(fc.double({ min: -200, max: 200, noNaN: true }), { minLength: 2, maxLength: 12 }),
  r0: fc.double({ min: -3000, max: 0, noNaN: true }),
  tilt: fc.double({ min: -0.05, max: 0.05, noNaN: true }),
});

const sectionArb = fc.array(horizonArb, { minLength: 3, maxLength: 5 }).map((hs): LineSection => ({
  units: 'm',
  pins: [0, 1000],
  horizons: hs.map((h, k) => {
    const reg = (x: number) => h.r0 - 300 * k + h.tilt * x;
    const line: XZ[] = h.zs.map((z, i) => {
      const x = -50 + (1100 * i) / (h.zs.length - 1);
      return [x, reg(x) + z];
    });
    return { name: `H${k}`, line, regional: [[-100, reg(-100)], [1100, reg(1100)]] };
  }),
}));

function run(s: Section): SectionAnalysis {
  const out = analyseSection(s);
  if (!out.ok) throw new Error(out.problems[0].message);
  return out.analysis;
}

function map(s: LineSection, f: (p: XZ) => XZ, pins: (p: [number, number]) => [number, number] = (p) => p): LineSection {
  return { ...s, pins: pins(s.pins), horizons: s.horizons.map((h) => ({ ...h, line: h.line.map(f), regional: h.regional.map(f) })) };
}

function near(a: number | null, b: number | null, rel: number, abs: number): boolean {
  if (a === null || b === null) return a === b;
  return Math.abs(a - b) <= abs + rel * Math.abs(b);
}

/** Areas scale by k², lengths and depths by k; the detachment depth by k. */
function expectScaled(a: SectionAnalysis, b: SectionAnalysis, k: number, rel: number): void {
  a.horizons.forEach((h, i) => {
    const g = b.horizons[i];
    // Absolute floors relative to the coordinate scale: pin width × vertical extent (areas), pin width (depths).
    const extent = b.pinWidth + maxOf(b.horizons.map((x) => Math.abs(x.depth)));
    expect(near(h.excessArea * k * k, g.excessArea, rel, rel * b.pinWidth * extent), `area ${h.excessArea * k * k} vs ${g.excessArea}`).toBe(true);
    expect(near(h.bedLength * k, g.bedLength, rel, 0), 'bed length').toBe(true);
    expect(near(h.depth * k, g.depth, rel, rel * extent), `depth ${h.depth * k} vs ${g.depth}`).toBe(true);
  });
  const da = a.areaDepth;
  const db = b.areaDepth;
  expect(da === null).toBe(db === null);
  if (da && db && !da.noDetachment && !db.noDetachment && Math.abs(da.slope) > 1e-3 * a.pinWidth) {
    expect(near(da.detachmentDepth! * k, db.detachmentDepth!, 1e-6, 1e-6 * b.pinWidth), 'detachment depth').toBe(true);
  }
}

describe('analyseSection(section) invariants (fast-check)', () => {
  it('is unchanged by translating x and z (map-scale offsets x ~ 1e6 keep digits)', () => {
    fc.assert(fc.property(sectionArb, fc.double({ min: 1e5, max: 1e6, noNaN: true }), fc.double({ min: -5000, max: 5000, noNaN: true }), (s, dx, dz) => {
      const moved = map(s, ([x, z]) => [x + dx, z + dz], ([l, r]) => [l + dx, r + dx]);
      const a = run(s);
      const b = run(moved);
      a.horizons.forEach((h, i) => {
        expect(near(b.horizons[i].excessArea, h.excessArea, 1e-9, 1e-6)).toBe(true);
        expect(near(b.horizons[i].bedLength, h.bedLength, 1e-12, 1e-9)).toBe(true);
        expect(near(b.horizons[i].depth, h.depth, 1e-9, 1e-6)).toBe(true);
      });
    }));
  });

  it('is unchanged by reversing every horizon and regional', () => {
    fc.assert(fc.property(sectionArb, (s) => {
      const r: LineSection = { ...s, horizons: s.horizons.map((h) => ({ ...h, line: [...h.line].reverse(), regional: [...h.regional].reverse() })) };
      const a = run(s);
      const b = run(r);
      a.horizons.forEach((h, i) => {
        expect(near(b.horizons[i].excessArea, h.excessArea, 1e-12, 1e-8)).toBe(true);
        expect(near(b.horizons[i].bedLength, h.bedLength, 1e-12, 0)).toBe(true);
      });
    }));
  });

  it('is unchanged by inserting collinear vertices', () => {
    fc.assert(fc.property(sectionArb, fc.double({ min: 0.05, max: 0.95, noNaN: true }), (s, t) => {
      const densify = (l: XZ[]): XZ[] => l.flatMap((p, i) => (i === 0 ? [p] : [[l[i - 1][0] + t * (p[0] - l[i - 1][0]), l[i - 1][1] + t * (p[1] - l[i - 1][1])] as XZ, p]));
      const d: LineSection = { ...s, horizons: s.horizons.map((h) => ({ ...h, line: densify(h.line), regional: densify(h.regional) })) };
      const a = run(s);
      const b = run(d);
      a.horizons.forEach((h, i) => {
        expect(near(b.horizons[i].excessArea, h.excessArea, 1e-9, 1e-6)).toBe(true);
        expect(near(b.horizons[i].bedLength, h.bedLength, 1e-12, 1e-9)).toBe(true);
        expect(near(b.horizons[i].regionalElevation, h.regionalElevation, 1e-12, 1e-9)).toBe(true);
      });
    }));
  });

  it('scales areas by k² and lengths and depths by k, unchanged (relative) at scales 1e-3 and 1e4', () => {
    fc.assert(fc.property(sectionArb, fc.constantFrom(1e-3, 0.3048, 7, 1e4), (s, k) => {
      const scaled = map(s, ([x, z]) => [k * x, k * z], ([l, r]) => [k * l, k * r]);
      expectScaled(run(s), run(scaled), k, 1e-9);
    }));
  });
});

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyseSection } from '../../../src/core/analysis/analyseSection';
import { createEvaluationScratch, evaluateShifted } from '../../../src/core/analysis/evaluateShifted';
import { prepareSection, type PreparedSection } from '../../../src/core/analysis/prepareSection';
import { shiftRegionals } from '../../../src/core/analysis/shiftRegionals';
import type { Section } from '../../../src/core/model/section';
import { expectClose } from '../../expectClose';
import { methodExample, pts } from './sections';

function prepared(s: Section): PreparedSection {
  const p = prepareSection(s);
  if (!p.ok) throw new Error(p.problems[0].message);
  return p.prepared;
}

/** A section with gently bent, inclined regionals and folds that dip below them. */
function bentSection(): Section {
  return {
    units: 'm',
    pins: [0, 2000],
    referenceElevation: 0,
    horizons: [0, 1, 2].map((k) => {
      const r = (x: number) => -400 * (k + 1) + 0.02 * x + (x > 1000 ? 0.01 * (x - 1000) : 0);
      const xs = [-100, 300, 800, 1200, 1700, 2100];
      const bump = [0, 250 - 50 * k, 300 - 60 * k, -80, 150, 0];
      return { name: `B${k}`, line: xs.map((x, i) => [x, r(x) + bump[i]] as [number, number]), regional: pts(-100, r(-100), 1000, r(1000), 2100, r(2100)) };
    }),
  };
}

function movedRegionals(s: Section, f: (x: number, i: number) => number): Section {
  return { ...s, horizons: s.horizons.map((h, i) => ({ ...h, regional: h.regional.map(([x, z]) => [x, z + f(x, i)] as [number, number]) })) };
}

describe('shiftRegionals(prepared, adjustment)', () => {
  it('matches re-analysing the section with every regional moved by δᵢ + t(x − xPivot) (property)', () => {
    // Brute-force reference: move the regional vertices and run the full analysis again.
    const s = bentSection();
    const p = prepared(s);
    const d = fc.double({ min: -200, max: 200, noNaN: true });
    fc.assert(fc.property(d, d, d, fc.double({ min: -0.05, max: 0.05, noNaN: true }), fc.double({ min: -500, max: 2500, noNaN: true }), (o0, o1, o2, t, xp) => {
      const offsets = [o0, o1, o2];
      const m = shiftRegionals(p, { regionalOffsets: offsets, regionalTilt: t, tiltPivotX: xp });
      const out = analyseSection(movedRegionals(s, (x, i) => offsets[i] + t * (x - xp)));
      if (!out.ok) throw new Error(out.problems[0].message);
      out.analysis.horizons.forEach((h, i) => {
        expectClose(m.areas[i], h.excessArea, 1e-9, { abs: 1e-6 });
        expectClose(m.depths[i], h.depth, 1e-9, { abs: 1e-9 });
        expectClose(m.regionalLengths[i], h.regionalLength, 1e-12);
      });
    }));
  });

  it('writes into the given buffers and scales areas by k² and depths by k', () => {
    const p = prepared(methodExample());
    const out = createEvaluationScratch(p).measures;
    const m = shiftRegionals(p, { scale: 0.3048 }, out);
    expect(m).toBe(out);
    expectClose(m.areas[0], 2.5e6 * 0.3048 ** 2, 1e-12);
    expectClose(m.depths[0], 500 * 0.3048, 1e-12);
  });
});

describe('evaluateShifted(prepared, adjustment)', () => {
  it('returns the synthetic answer (docs/method.md §Check values) with no adjustment', () => {
    // Source: the synthetic example of docs/method.md §Check values, D = 1000 m, zd = 3000 m.
    const q = evaluateShifted(prepared(methodExample()))!;
    expectClose(q.displacement, 1000, 1e-10);
    expectClose(q.detachmentDepth!, 3000, 1e-10);
    expectClose(q.detachmentElevation!, -3000, 1e-10);
  });

  it('follows the closed form zd − δ(1 + W0/D) for a common regional offset δ', () => {
    // Source: docs/method.md §Sensitivity to the regional (our derivation, exact for flat regionals).
    const p = prepared(methodExample());
    const scratch = createEvaluationScratch(p);
    // Offsets that keep the zero crossing below the deepest horizon (2000 − δ), where it is a detachment.
    for (const delta of [-150, -20, 35, 80]) {
      const q = evaluateShifted(p, { regionalOffset: delta }, scratch)!;
      expectClose(q.detachmentDepth!, 3000 - delta * (1 + 10_000 / 1000), 1e-9);
      expectClose(q.displacement, 1000, 1e-9);
    }
  });

  it('agrees with analyseSection on a moved section (D and zd)', () => {
    const s = bentSection();
    const q = evaluateShifted(prepared(s), { regionalOffset: 40, regionalTilt: 0.01 })!;
    const out = analyseSection(movedRegionals(s, (x) => 40 + 0.01 * (x - 0)));
    if (!out.ok) throw new Error(out.problems[0].message);
    expectClose(q.displacement, out.analysis.areaDepth!.displacement, 1e-9);
    expectClose(q.detachmentDepth!, out.analysis.areaDepth!.detachmentDepth!, 1e-9);
  });

  it('adds per-horizon area changes before the fit', () => {
    // A = D (zd − h) with every area raised by D·100 moves zd down by 100 m (analytic).
    const q = evaluateShifted(prepared(methodExample()), { areaDeltas: [1e5, 1e5, 1e5, 1e5] })!;
    expectClose(q.detachmentDepth!, 3100, 1e-10);
  });

  it('is null when fewer than two horizons are included', () => {
    const s = methodExample();
    s.horizons.forEach((h, i) => { h.include = i === 0; });
    expect(evaluateShifted(prepared(s))).toBeNull();
  });

  it('reports no detachment when areas grow with depth', () => {
    const q = evaluateShifted(prepared(methodExample()), { areaDeltas: [0, 1e6, 2e6, 3e6] })!;
    expect(q.noDetachment).toBe(true);
    expect(q.detachmentDepth).toBeNull();
  });
});

describe('prepareSection(section)', () => {
  it('keeps clipped typed arrays running from the left pin to the right pin', () => {
    const p = prepared(bentSection());
    for (const h of p.horizons) {
      expect(h.line.xs[0]).toBe(0);
      expect(h.line.xs[h.line.xs.length - 1]).toBe(2000);
      expect(h.regional.xs[0]).toBe(0);
      expect(h.line.xs).toBeInstanceOf(Float64Array);
    }
    expect(Array.from(p.included)).toEqual([1, 1, 1]);
    expect(p.pinWidth).toBe(2000);
  });
});

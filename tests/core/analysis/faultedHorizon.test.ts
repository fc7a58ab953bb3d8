import { describe, expect, it } from 'vitest';
import { analyseSection, type SectionAnalysis } from '../../../src/core/analysis/analyseSection';
import { selfIntersections } from '../../../src/core/geometry/selfIntersections';
import type { Section, XZ } from '../../../src/core/model/section';
import { expectClose } from '../../expectClose';

// A horizon in pieces is measured along its joined line: pieces in order, joined along the fault
// between the cutoffs (docs/method.md §Faults and horizons in pieces; Epard & Groshong 1993).

/**
 * A small Z-shaped thrust repeat, pins [0, 10], regional z = 0, fault z = x − 4:
 * hanging-wall piece (−1, 1) → (4, 2) → (6, 2) ends on the fault at (6, 2); the join runs back down the
 * fault to (4, 0); the footwall piece runs on from (4, 0) to (11, 0).
 */
function zSection(rightToLeft = false): Section {
  const hanging: XZ[] = [[-1, 1], [4, 2], [6, 2]];
  const footwall: XZ[] = [[4, 0], [11, 0]];
  const pieces = rightToLeft ? [footwall.slice().reverse(), hanging.slice().reverse()] : [hanging, footwall];
  return {
    units: 'm', pins: [0, 10], referenceElevation: 0,
    faults: [{ name: 'F1', line: [[3, -1], [7, 3]] }],
    horizons: [{ name: 'A', pieces, regional: [[-1, 0], [11, 0]] }],
  };
}

function analysed(s: Section): SectionAnalysis {
  const out = analyseSection(s);
  if (!out.ok) throw new Error(out.problems.map((p) => p.message).join('\n'));
  return out.analysis;
}

describe('a Z-shaped thrust repeat (hand-computed)', () => {
  for (const rightToLeft of [false, true]) {
    const order = rightToLeft ? 'digitised right to left' : 'digitised left to right';
    it(`gives the composite excess area 8.4, bed length of the pieces only and the cutoff (${order})`, () => {
      const h = analysed(zSection(rightToLeft)).horizons[0];
      // Hand computation (trapezoids over the regional z = 0): the hanging wall from the left pin,
      // (0, 1.2) → (4, 2): (1.2 + 2)/2 · 4 = 6.4; (4, 2) → (6, 2): 2 · 2 = 4; back down the fault
      // (6, 2) → (4, 0): the triangle below it, −2; the footwall piece on the regional: 0. A = 8.4.
      expectClose(h.excessArea, 8.4, 1e-14);
      // Bed length: pieces only, √(4² + 0.8²) + 2 + 6 (the fault stretch, 2√2, is not bed).
      expectClose(h.bedLength, Math.sqrt(16.64) + 8, 1e-14);
      expect(h.pieces).toBe(2);
      expect(h.cutoffs).toHaveLength(1);
      const c = h.cutoffs[0];
      expect(c.fault).toBe('F1');
      // from = end of the first piece, to = start of the next, as digitised.
      expect([c.from, c.to]).toEqual(rightToLeft ? [[4, 0], [6, 2]] : [[6, 2], [4, 0]]);
      expectClose(c.slip, 2 * Math.SQRT2, 1e-15);
      expect(c.heave).toBe(2);
      expect(c.throw).toBe(2);
    });
  }

  it('is not a self-crossing: the joined line doubles back along the fault without crossing itself', () => {
    // The joined line itself, as the analysis builds it: hanging wall, the fault back down, footwall.
    const joined: XZ[] = [[-1, 1], [4, 2], [6, 2], [4, 0], [11, 0]];
    expect(selfIntersections(joined.map((p) => p[0]), joined.map((p) => p[1]))).toEqual([]);
    expect(analyseSection(zSection()).ok).toBe(true);
  });

  it('follows the fault through its own vertices between the cutoffs (either direction)', () => {
    // Fault with a bend at (5, 1.5) between the cutoffs: the join runs (6, 2) → (5, 1.5) → (4, 0).
    const s = zSection();
    s.faults = [{ name: 'F1', line: [[3, -1], [4, 0], [5, 1.5], [6, 2], [7, 3]] }];
    s.horizons[0].pieces = [[[-1, 1], [4, 2.5], [6, 2]], [[4, 0], [11, 0]]];
    const h = analysed(s).horizons[0];
    // Trapezoids: (0, 1.3) → (4, 2.5): 7.6; (4, 2.5) → (6, 2): 4.5; fault back (6, 2) → (5, 1.5): −1.75;
    // (5, 1.5) → (4, 0): −0.75. A = 9.6.
    expectClose(h.excessArea, 9.6, 1e-14);
    expectClose(h.cutoffs[0].slip, Math.hypot(1, 0.5) + Math.hypot(1, 1.5), 1e-15);
  });

  it('joins a normal-fault gap the other way along the fault (hand-computed)', () => {
    // The hanging wall dropped down the fault z = x − 4: its piece ends on the fault at (2, −2), the
    // footwall piece starts at (4, 0), and the join runs up the fault from (2, −2) to (4, 0).
    const s: Section = {
      units: 'm', pins: [0, 10], referenceElevation: 0,
      faults: [{ name: 'N', line: [[1, -3], [5, 1]] }],
      horizons: [{ name: 'B', pieces: [[[-1, -2], [2, -2]], [[4, 0], [11, 0]]], regional: [[-1, 0], [11, 0]] }],
    };
    const h = analysed(s).horizons[0];
    // Trapezoids: (0, −2) → (2, −2): −4; up the fault (2, −2) → (4, 0): −2. A = −6 (lost area).
    expectClose(h.excessArea, -6, 1e-14);
    expectClose(h.bedLength, 2 + 6, 1e-14);
    expectClose(h.cutoffs[0].slip, 2 * Math.SQRT2, 1e-15);
  });

  it('names the horizon whose joined line really crosses itself', () => {
    // The footwall piece climbs back over the hanging-wall piece.
    const s = zSection();
    s.horizons[0].pieces = [[[-1, 1], [4, 2], [6, 2]], [[4, 0], [5, 3], [11, 0]]];
    const out = analyseSection(s);
    expect(out.ok).toBe(false);
    if (out.ok) return;
    expect(out.problems.map((p) => [p.code, p.horizon])).toEqual([['self-intersecting', 'A']]);
    expect(out.problems[0].message).toMatch(/^Horizon "A": the joined line \(its pieces and the fault between them\) crosses itself/);
  });

  it('counts projected runs along the pieces and keeps them off the fault stretch', () => {
    // Mark the footwall piece (vertices 3–4 counted along the pieces) as projected: 6 of bed length.
    const s = zSection();
    s.horizons[0].projected = [[3, 4]];
    const h = analysed(s).horizons[0];
    expectClose(h.projectedLength, 6, 1e-14);
    expectClose(h.excessArea, 8.4, 1e-14);
  });
});

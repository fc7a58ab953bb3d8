import fc from 'fast-check';
import * as polygonClipping from 'polygon-clipping';
import { describe, expect, it } from 'vitest';
import { excessArea } from '../../../src/core/analysis/excessArea';
import type { XZ } from '../../../src/core/model/section';
import { expectClose } from '../../expectClose';
import { pts } from './sections';

const flat = (z: number, a = -1e9, b = 1e9): XZ[] => [[a, z], [b, z]];

describe('excessArea(horizon, regional, pins)', () => {
  it('is ½·base·height for a triangular fold', () => {
    // Analytic: triangle base 100, height 100.
    expect(excessArea(pts(0, 0, 50, 100, 100, 0), flat(0), [0, 100])).toBe(5000);
  });

  it('is the trapezoid area for a box fold', () => {
    // Analytic: trapezoid (40 + 60)/2 · 100.
    expect(excessArea(pts(0, 0, 20, 0, 30, 100, 70, 100, 80, 0, 100, 0), flat(0), [0, 100])).toBe(5000);
  });

  it('is aλ/2 for a full sine bump a·sin²(πx/λ), within the trapezoid-rule bound of the sampling', () => {
    // Analytic: ∫₀^λ a sin²(πx/λ) dx = aλ/2. Sampled at jittered x; the trapezoid-rule error is at most
    // λ·h²·max|f''|/12 with max|f''| = 2aπ²/λ² (common practice: composite trapezoid error bound).
    const a = 250;
    const lambda = 4000;
    const n = 400;
    const line: XZ[] = [];
    let hMax = 0;
    let prev = 0;
    for (let i = 0; i <= n; i++) {
      const x = i === 0 || i === n ? (i / n) * lambda : ((i + 0.4 * Math.sin(7 * i)) / n) * lambda;
      hMax = Math.max(hMax, x - prev);
      prev = x;
      line.push([x, a * Math.sin((Math.PI * x) / lambda) ** 2]);
    }
    const bound = (lambda * hMax * hMax * ((2 * a * Math.PI ** 2) / lambda ** 2)) / 12;
    const area = excessArea(line, flat(0), [0, lambda]);
    expect(Math.abs(area - (a * lambda) / 2)).toBeLessThanOrEqual(bound);
    expect(Math.abs(area - (a * lambda) / 2)).toBeLessThan(1e-3 * (a * lambda) / 2);
  });

  it('is negative below the regional', () => {
    // Analytic: a syncline triangle 100 wide and 40 deep: −2000.
    expect(excessArea(pts(0, 0, 50, -40, 100, 0), flat(0), [0, 100])).toBe(-2000);
  });

  it('adds the anticline and subtracts the syncline', () => {
    // Analytic: +½·50·40 − ½·50·20 = 1000 − 500.
    expect(excessArea(pts(0, 0, 25, 40, 50, 0, 75, -20, 100, 0), flat(0), [0, 100])).toBe(500);
  });

  it('handles an overturned limb by the loop', () => {
    // Analytic, by horizontal slices: width(z) = 80 − 0.4z on [0, 100] and 30 + 0.1z on [100, 200]:
    // 6000 + 4500 = 10 500. The limb from (50, 100) to (30, 200) leans back over the fold core.
    expect(excessArea(pts(0, 0, 20, 0, 50, 100, 30, 200, 80, 200, 100, 0), flat(0), [0, 100])).toBe(10_500);
  });

  it('is the same for a horizon given right to left', () => {
    const line = pts(0, 0, 20, 0, 50, 100, 30, 200, 80, 200, 100, 0);
    expect(excessArea([...line].reverse(), [[1e9, 0], [-1e9, 0]], [0, 100])).toBe(10_500);
  });

  it('clips vertices beyond the pins at the exact crossing', () => {
    // Analytic: the part between the pins is the triangle (0,0)-(50,100)-(100,0); outside vertices are ignored.
    const line = pts(-80, 300, -50, -100, 50, 100, 150, -100, 200, 700);
    expect(excessArea(line, flat(0), [0, 100])).toBe(5000);
  });

  it('measures vertically against an inclined regional', () => {
    // Analytic: a triangle of height 100 on a regional z = 0.2x keeps its area (a shear preserves area).
    const tilt = (x: number) => 0.2 * x;
    const line: XZ[] = [[0, tilt(0)], [50, tilt(50) + 100], [100, tilt(100)]];
    expectClose(excessArea(line, [[-10, tilt(-10)], [110, tilt(110)]], [0, 100]), 5000, 1e-12);
  });

  it('is NaN when the horizon does not reach a pin', () => {
    expect(excessArea(pts(10, 0, 100, 0), flat(0), [0, 100])).toBeNaN();
  });

  it('agrees with polygon-clipping boolean operations on simple folds (property)', () => {
    // Independent check: the registry library polygon-clipping (v0.15.7) clips the areas under the horizon and
    // under the regional to the pin box; excess = area(under H − under R) − area(under R − under H).
    const ringArea = (ring: [number, number][]) => {
      let s = 0;
      for (let i = 0; i < ring.length - 1; i++) s += ring[i][0] * ring[i + 1][1] - ring[i + 1][0] * ring[i][1];
      return Math.abs(s) / 2;
    };
    const mpArea = (mp: polygonClipping.MultiPolygon) => mp.reduce((s, poly) => s + poly.reduce((t, ring, k) => t + (k === 0 ? 1 : -1) * ringArea(ring), 0), 0);
    const z = fc.integer({ min: -300, max: 300 });
    fc.assert(fc.property(fc.array(z, { minLength: 3, maxLength: 15 }), z, z, (zs, r0, r1) => {
      const pL = 0;
      const pR = 1000;
      const line: XZ[] = zs.map((v, i) => [-100 + (1200 * i) / (zs.length - 1), v]);
      const regional: XZ[] = [[-200, r0], [1200, r1]];
      const base = -10_000;
      const under = (l: XZ[]): polygonClipping.Polygon => [[...l, [l[l.length - 1][0], base], [l[0][0], base], l[0]]];
      const box: polygonClipping.Polygon = [[[pL, base - 1], [pR, base - 1], [pR, 10_000], [pL, 10_000], [pL, base - 1]]];
      const uh = polygonClipping.intersection(under(line), box);
      const ur = polygonClipping.intersection(under(regional), box);
      const expected = mpArea(polygonClipping.difference(uh, ur)) - mpArea(polygonClipping.difference(ur, uh));
      expectClose(excessArea(line, regional, [pL, pR]), expected, 1e-9, { abs: 1e-6 });
    }));
  });
});

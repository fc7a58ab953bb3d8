import { describe, expect, it } from 'vitest';
import { leastSquares } from '../../../src/core/stats/leastSquares';
import type { GraphPoint } from '../../../src/panels/interpretation/areaDepthSeries';
import { outlierFlagDistance, outlierFlags } from '../../../src/panels/interpretation/outlierFlags';

// On the synthetic line A = 1000·(3000 − h) of docs/method.md §Check values (our own example), with one point moved off.
function points(offsets: number[], projected: number[] = []): GraphPoint[] {
  return [500, 1000, 1500, 2000, 2500, 2800].map((h, i) => ({
    id: `h${i}`, name: `H${i}`, depth: h, area: 1000 * (3000 - h) + (offsets[i] ?? 0), included: true, residual: null,
    projectedAreaShare: projected[i] ?? 0,
  }));
}

function flags(p: GraphPoint[]) {
  return outlierFlags(p, leastSquares(p.map((q) => q.depth), p.map((q) => q.area)));
}

describe('outlierFlags(points, fit)', () => {
  it('flags nothing on an exact line whose residuals are only rounding (r² = 1 to 12 digits)', () => {
    // Twelve points of A = 1000·(3000 − h) read back with rounding-sized offsets (about 1e-15 of the areas), one of
    // them larger: its studentized residual is about 3, so without the exact-fit rule it would be called far off.
    const p: GraphPoint[] = Array.from({ length: 12 }, (_, i) => {
      const h = 300 + 200 * i;
      const noise = i === 5 ? 4e-9 : (i % 2 ? 1 : -1) * 1e-10;
      return { id: `h${i}`, name: `H${i}`, depth: h, area: 1000 * (3000 - h) + noise, included: true, residual: null, projectedAreaShare: 0 };
    });
    const fit = leastSquares(p.map((q) => q.depth), p.map((q) => q.area));
    if (!fit) throw new Error('the fit needs two depths');
    const k = 5;
    const leverage = 1 / fit.n + ((p[k].depth - fit.xMean) ** 2) / fit.sxx;
    expect(Math.abs(fit.residuals[k] / (fit.s * Math.sqrt(1 - leverage)))).toBeGreaterThan(2);
    expect(outlierFlags(p, fit)).toEqual([]);
  });

  it('flags nothing for points on the line (up to tiny scatter)', () => {
    expect(flags(points([1000, -800, 500, -900, 700, -500]))).toEqual([]);
  });

  it('flags a shallow point with too little area as possible growth strata or erosion', () => {
    const f = flags(points([-700_000]));
    const worst = [...f].sort((a, b) => Math.abs(b.residual) - Math.abs(a.residual))[0];
    expect(worst.id).toBe('h0');
    expect(worst.residual).toBeLessThan(0);
    expect(worst.reasons.join(' ')).toMatch(/growth strata/);
    expect(worst.reasons.join(' ')).toMatch(/erosion/);
    expect(f.map((x) => x.id)).not.toContain('h3');
  });

  it('flags a shallow point with too much area as a possible upper detachment', () => {
    const f = flags(points([600_000]));
    expect(f.map((x) => x.id)).toContain('h0');
    expect(f.find((x) => x.id === 'h0')!.reasons.join(' ')).toMatch(/upper detachment/);
  });

  it('offers thickness change (not growth strata) for a deep point, and erosion when it is projected', () => {
    const f = flags(points([0, 0, 0, 0, -500_000], [0, 0, 0, 0, 0.4]));
    const deep = f.find((x) => x.id === 'h4')!;
    expect(deep.reasons.join(' ')).toMatch(/thickness change/);
    expect(deep.reasons.join(' ')).toMatch(/erosion/);
    expect(deep.reasons.join(' ')).not.toMatch(/growth/);
  });

  it('ignores excluded points and fits with fewer than three points', () => {
    const p = points([-700_000]);
    p[0].included = false;
    const inc = p.filter((q) => q.included);
    expect(outlierFlags(p, leastSquares(inc.map((q) => q.depth), inc.map((q) => q.area)))).toEqual([]);
    const two = points([]).slice(0, 2);
    expect(outlierFlags(two, leastSquares([500, 1000], [2.5e6, 2e6]))).toEqual([]);
  });
});

describe('outlierFlagDistance(flag, unit)', () => {
  it('writes a negative distance with the minus sign U+2212, in the area and in standard errors', () => {
    // The one number rule (src/format/formatQuantity.ts): every shown negative number takes U+2212.
    const f = { id: 'b', name: 'B1', residual: -1.364e6, studentized: -1.364, reasons: [] };
    expect(outlierFlagDistance(f, { factor: 1e-6, label: 'km²' })).toBe('\u22121.364 km², \u22121.4 standard errors');
    expect(outlierFlagDistance({ ...f, studentized: null }, { factor: 1, label: 'm²' })).toBe('\u22121364000 m²');
  });
});

import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import jStat from 'jstat';
import { createLeastSquaresWork, leastSquares } from '../../../src/core/stats/leastSquares';
import { leastSquaresThroughOrigin } from '../../../src/core/stats/leastSquaresThroughOrigin';
import { expectClose } from '../../expectClose';
import { certified, certifiedSD, readStrd } from './nistStrd';
import { maxOf } from '../../../src/core/stats/minMax';

describe('leastSquares(x, y) on NIST StRD Norris', () => {
  const { x, y, header } = readStrd('nist-strd-norris.csv');
  const fit = leastSquares(x, y);

  it('reads all 36 observations', () => {
    expect(x).toHaveLength(36); // NIST StRD Norris: 36 observations
  });

  it('matches the certified coefficients, their SEs, residual SD and R²', () => {
    expect(fit).not.toBeNull();
    if (!fit) return;
    // Source: NIST StRD linear regression "Norris", certified values (fixture header).
    expectClose(fit.slope, certified(header, 'B1'), 1e-12, { label: 'B1' });
    expectClose(fit.intercept, certified(header, 'B0'), 1e-10, { label: 'B0' });
    expectClose(fit.slopeSE, certifiedSD(header, 'B1'), 1e-10, { label: 'SD(B1)' });
    expectClose(fit.interceptSE, certifiedSD(header, 'B0'), 1e-10, { label: 'SD(B0)' });
    expectClose(fit.s, certified(header, 'residual SD'), 1e-10, { label: 'residual SD' });
    expectClose(fit.r2, certified(header, 'R-squared'), 1e-12, { label: 'R²' });
    // NIST StRD Norris ANOVA: residual SS and df.
    const sse = Array.from(fit.residuals).reduce((acc, r) => acc + r * r, 0);
    expectClose(sse, certified(header, 'residual SS'), 1e-9, { label: 'residual SS' });
    expect(fit.df).toBe(34);
    expect(fit.n).toBe(36);
  });
});

describe('leastSquaresThroughOrigin(x, y) on NIST StRD NoInt1', () => {
  const { x, y, header } = readStrd('nist-strd-noint1.csv');
  const fit = leastSquaresThroughOrigin(x, y);

  it('matches the certified slope, its SE, residual SD and uncentred R²', () => {
    expect(fit).not.toBeNull();
    if (!fit) return;
    // Source: NIST StRD linear regression "NoInt1", certified values (fixture header).
    expectClose(fit.slope, certified(header, 'B1'), 1e-12, { label: 'B1' });
    expectClose(fit.slopeSE, certifiedSD(header, 'B1'), 1e-10, { label: 'SD(B1)' });
    expectClose(fit.s, certified(header, 'residual SD'), 1e-10, { label: 'residual SD' });
    expectClose(fit.r2, certified(header, 'R-squared'), 1e-12, { label: 'R²' });
    expect(fit.df).toBe(10); // NIST NoInt1: 11 observations, 1 parameter
  });

  it('returns null when all x are zero or there are no points', () => {
    expect(leastSquaresThroughOrigin([0, 0], [1, 2])).toBeNull();
    expect(leastSquaresThroughOrigin([], [])).toBeNull();
  });
});

describe('leastSquares(x, y) against jStat.models.ols', () => {
  it('agrees with the jstat registry library on random data', () => {
    fc.assert(
      fc.property(
        // Values on a 1/97 grid in ±1000: no subnormals, where jstat's sums underflow.
        fc.array(fc.tuple(fc.integer({ min: -97_000, max: 97_000 }), fc.integer({ min: -97_000, max: 97_000 })), {
          minLength: 4,
          maxLength: 30,
        }).map((pairs) => pairs.map(([a, b]) => [a / 97, b / 97] as const)),
        (points) => {
          const x = points.map((p) => p[0]);
          const y = points.map((p) => p[1]);
          const xMean = x.reduce((a, b) => a + b, 0) / x.length;
          const spread = x.reduce((a, b) => a + (b - xMean) ** 2, 0);
          fc.pre(spread > x.length); // variance > 1: keeps the normal equations of the reference well conditioned
          const fit = leastSquares(x, y);
          if (!fit) return false;
          // Independent check: jStat.models.ols (registry package jstat 1.9.6), normal-equation solver.
          const ols = jStat.models.ols(y, x.map((v) => [1, v]));
          const scaleY = maxOf(y.map(Math.abs), 1);
          expect(Math.abs(fit.intercept - ols.coef[0])).toBeLessThanOrEqual(1e-7 * scaleY);
          expect(Math.abs(fit.slope - ols.coef[1])).toBeLessThanOrEqual(1e-7 * scaleY);
          if (Number.isFinite(ols.R2) && fit.r2 > 1e-6) expect(Math.abs(fit.r2 - ols.R2)).toBeLessThanOrEqual(1e-7);
          return true;
        },
      ),
    );
  });

  it('matches a hand computation for a small set', () => {
    // Independent arithmetic: x = 0,1,2,3, y = 1,3,2,5: x̄ = 1.5, ȳ = 2.75, Sxx = 5, Sxy = 5.5,
    // b = 1.1, a = 1.1, residuals −0.1, 0.8, −1.3, 0.6, SSE = 2.7, s² = 1.35.
    const fit = leastSquares([0, 1, 2, 3], [1, 3, 2, 5]);
    expect(fit).not.toBeNull();
    if (!fit) return;
    expectClose(fit.slope, 1.1, 1e-14);
    expectClose(fit.intercept, 1.1, 1e-14);
    expectClose(fit.sxx, 5, 1e-15);
    expectClose(fit.s, Math.sqrt(1.35), 1e-14);
    expectClose(fit.slopeSE, Math.sqrt(1.35 / 5), 1e-14);
    expectClose(fit.interceptSE, Math.sqrt(1.35 * (1 / 4 + 2.25 / 5)), 1e-14);
    expectClose(fit.r2, 1 - 2.7 / 8.75, 1e-14);
    [-0.1, 0.8, -1.3, 0.6].forEach((r, i) => expect(fit.residuals[i]).toBeCloseTo(r, 13));
  });
});

describe('leastSquares(x, y) degenerate input', () => {
  it('returns null for fewer than two points, equal x or non-finite values', () => {
    expect(leastSquares([], [])).toBeNull();
    expect(leastSquares([1], [2])).toBeNull();
    expect(leastSquares([2, 2, 2], [1, 2, 3])).toBeNull();
    expect(leastSquares([1, NaN], [1, 2])).toBeNull();
    expect(leastSquares([1, 2], [1, Infinity])).toBeNull();
  });

  it('throws when x and y differ in length', () => {
    expect(() => leastSquares([1, 2, 3], [1, 2])).toThrow(RangeError);
  });

  it('gives df 0, s 0 and NaN standard errors for two points', () => {
    const fit = leastSquares([1, 3], [2, 6]);
    expect(fit).not.toBeNull();
    if (!fit) return;
    expect(fit.df).toBe(0);
    expect(fit.s).toBe(0);
    expect(fit.slopeSE).toBeNaN();
    expect(fit.interceptSE).toBeNaN();
    expectClose(fit.slope, 2, 1e-15);
    expectClose(fit.intercept, 0, 1e-15);
  });

  it('gives r2 NaN when all y are equal', () => {
    const fit = leastSquares([1, 2, 3], [4, 4, 4]);
    expect(fit?.slope).toBe(0);
    expect(fit?.r2).toBeNaN();
  });
});

describe('leastSquares(x, y) properties', () => {
  const coordinate = fc.integer({ min: -1_000_000, max: 1_000_000 }).map((v) => v / 97); // no subnormals
  const distinctXs = fc
    .uniqueArray(fc.integer({ min: -5000, max: 5000 }), { minLength: 3, maxLength: 25 })
    .map((xs) => xs.map((v) => v / 7));

  it('has zero residuals and r2 = 1 on exact line data', () => {
    fc.assert(
      fc.property(distinctXs, coordinate, fc.double({ min: -100, max: 100, noNaN: true }), (x, a, b) => {
        fc.pre(Math.abs(b) > 1e-3);
        const y = x.map((v) => a + b * v);
        const fit = leastSquares(x, y);
        if (!fit) return false;
        const scale = maxOf(y.map(Math.abs), 1);
        for (const r of fit.residuals) expect(Math.abs(r)).toBeLessThanOrEqual(1e-12 * scale);
        expect(Math.abs(fit.slope - b)).toBeLessThanOrEqual(1e-12 * (Math.abs(b) + scale / 1e3));
        expect(fit.r2).toBeGreaterThan(1 - 1e-12);
        return true;
      }),
    );
  });

  it('keeps the slope and residuals when y is shifted', () => {
    fc.assert(
      fc.property(distinctXs, fc.array(coordinate, { minLength: 25, maxLength: 25 }), coordinate, (x, ys, shift) => {
        const y = x.map((_, i) => ys[i]);
        const base = leastSquares(x, y);
        const moved = leastSquares(
          x,
          y.map((v) => v + shift),
        );
        if (!base || !moved) return false;
        const scale = maxOf(y.map(Math.abs), Math.abs(shift), 1);
        expect(Math.abs(moved.slope - base.slope)).toBeLessThanOrEqual(1e-10 * scale);
        expect(Math.abs(moved.intercept - base.intercept - shift)).toBeLessThanOrEqual(1e-9 * scale);
        expect(Math.abs(moved.s - base.s)).toBeLessThanOrEqual(1e-9 * scale);
        return true;
      }),
    );
  });

  for (const k of [1e-3, 1e4]) {
    it(`scales consistently when x and y are both multiplied by ${k}`, () => {
      fc.assert(
        fc.property(distinctXs, fc.array(coordinate, { minLength: 25, maxLength: 25 }), (x, ys) => {
          const y = x.map((_, i) => ys[i]);
          const base = leastSquares(x, y);
          const scaled = leastSquares(
            x.map((v) => v * k),
            y.map((v) => v * k),
          );
          if (!base || !scaled) return false;
          const scale = maxOf(y.map(Math.abs), 1);
          // Slope is unit-free; intercept, s and the intercept SE carry the unit; r² is unit-free.
          expect(Math.abs(scaled.slope - base.slope)).toBeLessThanOrEqual(1e-10 * (Math.abs(base.slope) + scale));
          expect(Math.abs(scaled.intercept / k - base.intercept)).toBeLessThanOrEqual(1e-9 * scale);
          expect(Math.abs(scaled.s / k - base.s)).toBeLessThanOrEqual(1e-9 * scale);
          if (base.df > 0) expect(Math.abs(scaled.slopeSE - base.slopeSE)).toBeLessThanOrEqual(1e-9 * (base.slopeSE + scale / Math.sqrt(base.sxx)));
          if (Number.isFinite(base.r2)) expect(Math.abs(scaled.r2 - base.r2)).toBeLessThanOrEqual(1e-9);
          return true;
        }),
      );
    });
  }
});

describe('leastSquares(x, y, work): caller-held buffers', () => {
  const norris = readStrd('nist-strd-norris.csv');

  it('gives the certified NIST StRD Norris line with work buffers grown from too small a start', () => {
    const fit = leastSquares(norris.x, norris.y, createLeastSquaresWork(3))!;
    expectClose(fit.slope, certified(norris.header, 'B1'), 1e-12, { label: 'B1' });
    expectClose(fit.intercept, certified(norris.header, 'B0'), 1e-11, { label: 'B0' });
    expectClose(Array.from(fit.residuals).reduce((acc, r) => acc + r * r, 0), certified(norris.header, 'residual SS'), 1e-9, { label: 'residual SS' });
  });

  it('two computations interleaved, each with its own work, leave each other untouched', () => {
    // Two independent fits stepped in turn, as two sweeps sharing one thread would: each one's residuals
    // must stay those of a fit made alone (fresh buffers), not the other's.
    const a = { x: norris.x, y: norris.y, work: createLeastSquaresWork(norris.x.length) };
    const bx = [1, 2, 3, 4, 5, 6], by = [2.1, 3.9, 6.2, 7.8, 10.1, 12.2];
    const b = { x: bx, y: by, work: createLeastSquaresWork(bx.length) };
    const aloneA = leastSquares(a.x, a.y)!;
    const aloneB = leastSquares(b.x, b.y)!;
    for (let k = 0; k < 3; k++) {
      const fa = leastSquares(a.x, a.y, a.work)!;
      const fb = leastSquares(b.x, b.y, b.work)!;
      const fa2 = leastSquares(a.x, a.y, a.work)!;
      expect(Array.from(fa.residuals)).toEqual(aloneA.residuals);
      expect(Array.from(fb.residuals)).toEqual(aloneB.residuals);
      expect(fa2.slope).toBe(aloneA.slope);
      expect(fb.slope).toBe(aloneB.slope);
    }
  });
});

import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { fiellerInterval } from '../../../src/core/stats/fiellerInterval';
import { leastSquares, type LineFit } from '../../../src/core/stats/leastSquares';
import { studentTQuantile } from '../../../src/core/stats/studentTQuantile';
import { expectClose } from '../../expectClose';

// Graybill & Iyer, Regression Analysis (1994), reaction-chamber calibration example (docs/method.md §Check values).
const chamberX = [0, 10, 20, 30, 40, 50, 60, 70, 80, 90, 100];
const chamberY = [206.36, 225.52, 252.18, 289.33, 318.11, 349.49, 383.03, 410.7, 444.4, 469.14, 501.16];

function fitOf(x: number[], y: number[]): LineFit {
  const fit = leastSquares(x, y);
  if (!fit) throw new Error('fit expected');
  return fit;
}

describe('fiellerInterval(fit, y0, level)', () => {
  it('reproduces the Graybill & Iyer reaction-chamber example', () => {
    const fit = fitOf(chamberX, chamberY);
    // Source: Graybill & Iyer (1994) as listed in docs/method.md §Check values: a = 198.45636, b = 3.0298182, s = 4.045006.
    expectClose(fit.intercept, 198.45636, 1e-7);
    expectClose(fit.slope, 3.0298182, 1e-7);
    expectClose(fit.s, 4.045006, 1e-6);
    const result = fiellerInterval(fit, 400, 0.99);
    expect(result.kind).toBe('bounded');
    if (result.kind !== 'bounded') return;
    // Source: Graybill & Iyer (1994): x̂ = 66.52, 99% interval (65.07, 68.03), two decimals.
    expect(Math.abs(result.estimate - 66.52)).toBeLessThanOrEqual(0.005);
    expect(Math.abs(result.lo - 65.07)).toBeLessThanOrEqual(0.005);
    expect(Math.abs(result.hi - 68.03)).toBeLessThanOrEqual(0.005);
  });

  it('has bounded endpoints that solve (a + b x − y0)² = t² s² (1/n + (x − x̄)²/Sxx)', () => {
    // Property of the definition (Fieller 1954; docs/method.md §Fieller interval): the endpoints are the roots of the quadratic.
    const noise = fc.array(fc.double({ min: -1, max: 1, noNaN: true }), { minLength: 12, maxLength: 12 });
    fc.assert(
      fc.property(
        fc.integer({ min: 3, max: 12 }),
        fc.double({ min: -50, max: 50, noNaN: true }),
        fc.double({ min: 0.2, max: 20, noNaN: true }).chain((m) => fc.constantFrom(m, -m)),
        noise,
        fc.double({ min: -200, max: 200, noNaN: true }),
        fc.constantFrom(0.8, 0.9, 0.95, 0.99),
        (n, a, b, e, y0, level) => {
          const x = Array.from({ length: n }, (_, i) => i * 3 - 5);
          const y = x.map((v, i) => a + b * v + e[i]);
          const fit = fitOf(x, y);
          const result = fiellerInterval(fit, y0, level);
          fc.pre(result.kind === 'bounded');
          if (result.kind !== 'bounded') return;
          const t = studentTQuantile(0.5 + level / 2, fit.df);
          expect(result.lo).toBeLessThanOrEqual(result.estimate);
          expect(result.estimate).toBeLessThanOrEqual(result.hi);
          for (const xe of [result.lo, result.hi]) {
            // Compared as |a + b x − y0| against t s √(…): rounding in a + b x − y0 is absolute, about
            // eps times the size of the terms (and of the data), so it cannot be judged relative to a tiny s.
            const lhs = Math.abs(fit.intercept + fit.slope * xe - y0);
            const rhs = t * fit.s * Math.sqrt(1 / fit.n + (xe - fit.xMean) ** 2 / fit.sxx);
            const rounding = 1e-13 * (Math.abs(fit.intercept) + Math.abs(fit.slope * xe) + Math.abs(y0) + Math.abs(fit.yMean));
            expect(Math.abs(lhs - rhs)).toBeLessThanOrEqual(1e-9 * rhs + rounding);
          }
        },
      ),
    );
  });

  it('reports unbounded when g ≥ 1 (slope not distinguishable from zero)', () => {
    // Noisy data around a nearly flat line: g = t² s² / (b² Sxx) ≫ 1 (docs/method.md §Fieller interval).
    const fit = fitOf([0, 1, 2, 3, 4, 5], [0, 3, -2, 2.5, -1, 0.6]);
    const t = studentTQuantile(0.975, fit.df);
    expect((t * t * fit.s * fit.s) / (fit.slope * fit.slope * fit.sxx)).toBeGreaterThanOrEqual(1);
    const result = fiellerInterval(fit, 1);
    expect(result.kind).toBe('unbounded');
    if (result.kind === 'unbounded') {
      expectClose(result.estimate, fit.xMean + (1 - fit.yMean) / fit.slope, 1e-12);
      expect(result.reason).toMatch(/unbounded/);
    }
  });

  it('switches from bounded to unbounded as the level rises past g = 1', () => {
    const fit = fitOf(chamberX, chamberY.map((v, i) => v + (i % 2 === 0 ? 90 : -90)));
    expect(fiellerInterval(fit, 400, 0.5).kind).toBe('bounded');
    expect(fiellerInterval(fit, 400, 0.999999).kind).toBe('unbounded');
  });

  it('gives none for n = 2 and for a zero slope', () => {
    const two = fiellerInterval(fitOf([0, 1], [1, 3]), 2);
    expect(two.kind).toBe('none');
    if (two.kind === 'none') expectClose(two.estimate ?? NaN, 0.5, 1e-15);
    const flat = fiellerInterval(fitOf([0, 1, 2], [5, 5, 5]), 2);
    expect(flat).toMatchObject({ kind: 'none', estimate: null });
  });
});

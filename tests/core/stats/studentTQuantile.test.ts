import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import jStat from 'jstat';
import { studentTQuantile } from '../../../src/core/stats/studentTQuantile';
import { studentTCdf } from '../../../src/core/stats/studentTCdf';
import { expectClose } from '../../expectClose';

describe('studentTQuantile(p, df)', () => {
  it('matches the NIST/SEMATECH table of two-sided 95% points, df 1–10', () => {
    // Source: NIST/SEMATECH e-Handbook of Statistical Methods §1.3.6.7.2 (values in docs/method.md §Check values), 3 decimals.
    const table = [12.706, 4.303, 3.182, 2.776, 2.571, 2.447, 2.365, 2.306, 2.262, 2.228];
    table.forEach((value, i) => {
      expect(Math.abs(studentTQuantile(0.975, i + 1) - value)).toBeLessThanOrEqual(0.0005 + 1e-12);
    });
  });

  it('equals the closed forms for df = 1, 2 and 4', () => {
    // Analytic: df = 1 is the Cauchy law, t = tan(π(p − ½)); df = 2 has F(t) = ½ + t / (2√(2 + t²)),
    // so t = (2p − 1)/√(2p(1 − p)); df = 4 (W. T. Shaw 2006, J. Computational Finance 9(4), recalled
    // from memory): with α = 4p(1 − p), q = cos(arccos(√α)/3)/√α, t = sign(p − ½)·2√(q − 1).
    for (const p of [1e-12, 1e-6, 0.001, 0.025, 0.1, 0.3, 0.45, 0.4999, 0.55, 0.8, 0.975, 0.995, 0.999999]) {
      const cauchy = p < 0.5 ? -1 / Math.tan(Math.PI * p) : 1 / Math.tan(Math.PI * (1 - p)); // tan(π(p − ½)) without rounding p − ½
      expectClose(studentTQuantile(p, 1), cauchy, 1e-12, { label: `df 1 p ${p}` });
      expectClose(studentTQuantile(p, 2), (2 * p - 1) / Math.sqrt(2 * p * (1 - p)), 1e-12, { label: `df 2 p ${p}` });
      const alpha = 4 * p * (1 - p);
      const q = Math.cos(Math.acos(Math.sqrt(alpha)) / 3) / Math.sqrt(alpha);
      // The closed form itself loses digits near p = ½ (q − 1 cancels), so compare with an absolute floor.
      const t4 = Math.sign(p - 0.5) * 2 * Math.sqrt(q - 1);
      expect(Math.abs(studentTQuantile(p, 4) - t4)).toBeLessThanOrEqual(1e-11 * Math.max(1, Math.abs(t4)));
    }
  });

  it('is odd in p − ½ and 0 at p = ½', () => {
    expect(studentTQuantile(0.5, 3)).toBe(0);
    for (const df of [0.3, 1, 2.5, 9, 40]) {
      for (const p of [0.01, 0.2, 0.4]) expectClose(studentTQuantile(1 - p, df), -studentTQuantile(p, df), 1e-13);
    }
  });

  it('agrees with jstat through jstat’s own CDF (df incl. non-integer and large)', () => {
    // Independent check: registry package jstat 1.9.6, jStat.studentt.cdf, whose own error reaches
    // ~6e-8 relative (see studentTCdf.test.ts), hence 1e-7. Its inverse is weaker still (~3e-8:
    // −0.99999994 for the exact −1 at p = ¼, df = 1).
    const dfs = [1, 1.5, 2, 2.7, 3, 4, 5, 6.25, 8, 10, 13.3, 20, 30, 50, 100, 333.3, 1000, 1e4]; // jstat drifts above 1e4
    for (const df of dfs) {
      for (const p of [0.001, 0.01, 0.05, 0.2, 0.75, 0.9, 0.95, 0.975, 0.995]) {
        const t = studentTQuantile(p, df);
        expectClose(jStat.studentt.cdf(t, df), p, 1e-7, { label: `df ${df} p ${p}` });
      }
    }
  });

  it('agrees with jStat.studentt.inv to that library’s own accuracy', () => {
    // Independent check: registry package jstat 1.9.6 (its inverse is a Halley iteration stopped near 1e-8).
    for (const df of [1, 2.5, 4, 7, 15.5, 60, 500, 1e4]) {
      for (const p of [0.005, 0.05, 0.1, 0.9, 0.975, 0.999]) {
        expectClose(studentTQuantile(p, df), jStat.studentt.inv(p, df), 1e-7, { label: `df ${df} p ${p}` });
      }
    }
  });

  it('approaches the normal quantile for very large df (A&S 26.7.5 first-order term)', () => {
    // Source: Abramowitz & Stegun 26.7.5, t ≈ z + (z³ + z)/(4ν); z(0.975) = 1.959963984540054
    // (normal quantile, as given by jStat.normal.inv, registry package jstat 1.9.6).
    const z = jStat.normal.inv(0.975, 0, 1);
    for (const df of [1e7, 1e9, 1e12, 1e15]) {
      expectClose(studentTQuantile(0.975, df), z + (z ** 3 + z) / (4 * df), 1e-12, { label: `df ${df}` });
    }
  });

  it('inverts studentTCdf: studentTCdf(studentTQuantile(p, df), df) ≈ p', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-12, max: 1 - 1e-12, noNaN: true }), fc.double({ min: 0.05, max: 1e9, noNaN: true }), (p, df) => {
        const t = studentTQuantile(p, df);
        const back = studentTCdf(t, df);
        // Relative in the smaller tail, which is what the solver matches; the cdf itself carries
        // ~1e-16·df relative noise from the incomplete-beta fraction up to df = 1e6.
        const tail = Math.min(p, 1 - p);
        expect(Math.abs(back - p)).toBeLessThanOrEqual((2e-12 + 1e-16 * Math.min(df, 1e6)) * tail + 2e-16);
      }),
    );
  });

  it('handles extreme tails and tiny df without overflow', () => {
    // Analytic (Cauchy): the 1e-300 quantile for df = 1 is −cot(π·1e-300) = −1/(π·1e-300).
    expectClose(studentTQuantile(1e-300, 1), -1 / (Math.PI * 1e-300), 1e-12);
    const t = studentTQuantile(0.975, 0.02);
    expect(t).toBeGreaterThan(1e60);
    expectClose(1 - studentTCdf(t, 0.02), 0.025, 1e-10);
  });

  it('returns ±Infinity at p = 0, 1 and NaN for bad input', () => {
    expect(studentTQuantile(0, 5)).toBe(-Infinity);
    expect(studentTQuantile(1, 5)).toBe(Infinity);
    for (const [p, df] of [[NaN, 3], [-0.1, 3], [1.1, 3], [0.5, 0], [0.9, -2], [0.9, NaN], [0.9, Infinity]]) {
      expect(studentTQuantile(p, df)).toBeNaN();
    }
  });
});

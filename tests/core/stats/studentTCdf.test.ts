import { describe, expect, it } from 'vitest';
import jStat from 'jstat';
import { studentTCdf } from '../../../src/core/stats/studentTCdf';
import { expectClose } from '../../expectClose';

describe('studentTCdf(t, df)', () => {
  it('equals the closed forms for df = 1, 2, 3', () => {
    // Analytic (A&S 26.7.3–26.7.4 at small ν): F₁ = ½ + atan(t)/π; F₂ = ½ + t/(2√(2 + t²));
    // F₃ = ½ + (θ + sin θ cos θ)/π with θ = atan(t/√3).
    for (const t of [-1e6, -40, -3, -1, -0.2, 0, 1e-8, 0.5, 2, 7, 100]) {
      const theta = Math.atan(t / Math.sqrt(3));
      // These forms are accurate in absolute terms only (½ + … cancels in the lower tail).
      expect(Math.abs(studentTCdf(t, 1) - (0.5 + Math.atan(t) / Math.PI)), `df 1 t ${t}`).toBeLessThanOrEqual(5e-15);
      expect(Math.abs(studentTCdf(t, 2) - (0.5 + t / (2 * Math.sqrt(2 + t * t)))), `df 2 t ${t}`).toBeLessThanOrEqual(5e-15);
      const f3 = 0.5 + (theta + Math.sin(theta) * Math.cos(theta)) / Math.PI;
      expect(Math.abs(studentTCdf(t, 3) - f3), `df 3 t ${t}`).toBeLessThanOrEqual(5e-15);
    }
  });

  it('is accurate in relative terms far into the lower tail', () => {
    // Analytic, rearranged to avoid cancellation: F₁(−u) = atan(1/u)/π;
    // F₂(−u) = 1/(b(b + u)) with b = √(2 + u²); F₃(−u) = (2φ − sin 2φ)/(2π) with φ = atan(√3/u).
    for (const u of [3, 10, 100, 1e4, 1e8]) {
      expectClose(studentTCdf(-u, 1), Math.atan(1 / u) / Math.PI, 1e-13, { label: `df 1 u ${u}` });
      const b = Math.sqrt(2 + u * u);
      expectClose(studentTCdf(-u, 2), 1 / (b * (b + u)), 1e-13, { label: `df 2 u ${u}` });
      if (u <= 100) {
        const phi = Math.atan(Math.sqrt(3) / u); // 2φ − sin 2φ cancels for small φ: stop at u = 100
        expectClose(studentTCdf(-u, 3), (2 * phi - Math.sin(2 * phi)) / (2 * Math.PI), 1e-11, { label: `df 3 u ${u}` });
      }
    }
  });

  it('agrees with jStat.studentt.cdf for integer, non-integer and large df', () => {
    // Independent check: registry package jstat 1.9.6. Its incomplete-beta fraction stops at a
    // tolerance of 3e-7 per step and it is off by up to ~6e-8 relative (e.g. 1.2e-8 at df 1.3,
    // t −0.4; 4.3e-8 at df 1000, t −1.5; 5.9e-8 at df 1000, t −3), so 1e-7 is its own accuracy;
    // the closed forms above pin ours to 1e-13. From df ~1e3 jstat drifts further (1.1e-7 at df 1e4, t −0.4).
    for (const df of [0.5, 1, 1.3, 2, 3.7, 5, 9, 17.2, 30, 120, 1000, 1e4]) {
      for (const t of [-8, -3, -1.5, -0.4, 0.1, 0.9, 2, 2.5, 4.2]) {
        const reference = jStat.studentt.cdf(t, df);
        expectClose(studentTCdf(t, df), reference, df >= 1000 ? 2e-7 : 1e-7, { label: `df ${df} t ${t}` });
      }
    }
  });

  it('approaches the normal law for very large df (A&S 26.7.8 first-order term)', () => {
    // Source: Abramowitz & Stegun 26.7.8, F(t; ν) = Φ(t) − φ(t)(t³ + t)/(4ν) + O(ν⁻²); Φ from
    // jStat.normal.cdf (registry package jstat 1.9.6). At ν ≥ 1e8 the O(ν⁻²) part is below 1e-15.
    for (const df of [1e8, 1e10, 1e13]) {
      for (const t of [-4, -1.96, -0.5, 1]) {
        const phi = Math.exp(-t * t / 2) / Math.sqrt(2 * Math.PI);
        const expected = jStat.normal.cdf(t, 0, 1) - (phi * (t ** 3 + t)) / (4 * df);
        expectClose(studentTCdf(t, df), expected, 1e-9, { label: `df ${df} t ${t}` });
      }
    }
  });

  it('is symmetric: F(−t) = 1 − F(t)', () => {
    for (const df of [0.7, 4, 25]) {
      for (const t of [0.3, 1.7, 6]) expect(Math.abs(studentTCdf(-t, df) - (1 - studentTCdf(t, df)))).toBeLessThanOrEqual(2e-16);
    }
  });

  it('returns 0 and 1 at ∓Infinity, ½ at 0 and NaN for bad input', () => {
    expect(studentTCdf(-Infinity, 3)).toBe(0);
    expect(studentTCdf(Infinity, 3)).toBe(1);
    expect(studentTCdf(0, 3)).toBe(0.5);
    expect(studentTCdf(NaN, 3)).toBeNaN();
    expect(studentTCdf(1, 0)).toBeNaN();
    expect(studentTCdf(1, -1)).toBeNaN();
    expect(studentTCdf(1, Infinity)).toBeNaN();
  });
});

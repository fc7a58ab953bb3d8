import { describe, expect, it } from 'vitest';
import jStat from 'jstat';
import { logBeta } from '../../../src/core/stats/logBeta';
import { logGamma } from '../../../src/core/stats/logGamma';
import { regularizedBeta } from '../../../src/core/stats/regularizedBeta';
import { expectClose } from '../../expectClose';

describe('logGamma(x), logBeta(a, b), regularizedBeta(x, a, b)', () => {
  it('logGamma matches factorials and Γ(½) = √π', () => {
    // Analytic: Γ(n) = (n − 1)!, Γ(½) = √π, Γ(3/2) = √π/2.
    let factorial = 1;
    for (let n = 1; n <= 30; n++) {
      if (n > 1) factorial *= n - 1;
      expect(Math.abs(logGamma(n) - Math.log(factorial))).toBeLessThanOrEqual(1e-14 * Math.max(1, Math.log(factorial)));
    }
    expect(Math.abs(logGamma(0.5) - 0.5 * Math.log(Math.PI))).toBeLessThanOrEqual(5e-15);
    expect(Math.abs(logGamma(1.5) - Math.log(Math.sqrt(Math.PI) / 2))).toBeLessThanOrEqual(5e-15);
    expect(logGamma(0)).toBeNaN();
    expect(logGamma(-1)).toBeNaN();
  });

  it('logGamma agrees with jStat.gammaln', () => {
    // Independent check: registry package jstat 1.9.6 (Lanczos form, ~1e-14 relative).
    for (const x of [1e-3, 0.3, 2.5, 7.7, 12.25, 100.5, 1e4, 3.3e6]) expectClose(logGamma(x), jStat.gammaln(x), 1e-12, { label: `x ${x}` });
  });

  it('logBeta agrees with its definition and keeps digits for large arguments', () => {
    // Analytic: B(a, 1) = 1/a; B(½, ½) = π; B(2, 3) = 1!·2!/4! = 1/12; B(5/2, 3/2) = Γ(5/2)Γ(3/2)/Γ(4) = π/16.
    expectClose(logBeta(3.7, 1), -Math.log(3.7), 1e-14);
    expectClose(logBeta(0.5, 0.5), Math.log(Math.PI), 1e-14);
    expectClose(logBeta(2, 3), -Math.log(12), 1e-14);
    expectClose(logBeta(2.5, 1.5), Math.log(Math.PI / 16), 1e-14);
    // Independent check: registry package jstat 1.9.6, jStat.betaln (from its own log-gamma).
    expectClose(logBeta(2.5, 4.25), jStat.betaln(2.5, 4.25), 1e-12);
    // Large a: ln B(a, ½) = ln Γ(½) + ln Γ(a) − ln Γ(a + ½), and Γ(a + ½)/Γ(a) = √a (1 − 1/(8a) + 1/(128a²) + …)
    // (A&S 6.1.47); at a = 1e8 the series is exact to 1e-25.
    const a = 1e8;
    const ratio = 0.5 * Math.log(a) + Math.log1p(-1 / (8 * a) + 1 / (128 * a * a));
    expectClose(logBeta(a, 0.5), 0.5 * Math.log(Math.PI) - ratio, 1e-14);
  });

  it('regularizedBeta matches closed forms and jStat.ibeta', () => {
    // Analytic: I_x(a, 1) = x^a; I_x(1, b) = 1 − (1 − x)^b; I_x(½, ½) = (2/π) asin √x.
    for (const x of [1e-9, 0.01, 0.3, 0.5, 0.77, 0.999]) {
      expectClose(regularizedBeta(x, 2.5, 1), x ** 2.5, 1e-13, { label: `x ${x}` });
      expectClose(regularizedBeta(x, 1, 3.5), -Math.expm1(3.5 * Math.log1p(-x)), 1e-13, { label: `x ${x}` });
      expectClose(regularizedBeta(x, 0.5, 0.5), (2 / Math.PI) * Math.asin(Math.sqrt(x)), 1e-13, { label: `x ${x}` });
      // Independent check: registry package jstat 1.9.6 (fraction tolerance 3e-7 per step).
      expectClose(regularizedBeta(x, 3.3, 7.1), jStat.ibeta(x, 3.3, 7.1), 1e-7, { label: `x ${x}` });
    }
    expect(regularizedBeta(0, 2, 3)).toBe(0);
    expect(regularizedBeta(1, 2, 3)).toBe(1);
    expect(regularizedBeta(1.2, 2, 3)).toBeNaN();
    expect(regularizedBeta(0.5, 0, 3)).toBeNaN();
  });
});

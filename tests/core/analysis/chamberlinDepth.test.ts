import { describe, expect, it } from 'vitest';
import { chamberlinDepth } from '../../../src/core/analysis/chamberlinDepth';
import { layerParallelStrain } from '../../../src/core/analysis/layerParallelStrain';
import { analyseSection } from '../../../src/core/analysis/analyseSection';
import { lengthBeyondSpan } from '../../../src/core/geometry/lengthBeyondSpan';
import type { Section } from '../../../src/core/model/section';
import { analysisNotes } from '../../../src/format/analysisNotes';
import { chamberlinReasonText } from '../../../src/format/chamberlinReasonText';

describe('chamberlinDepth(A, L − W, resolution)', () => {
  it('gives the reason as data and the one number rule writes it: "2e−6", with U+2212 and no trailing zero', () => {
    // A 1 mm bump 1 m wide: L − W = 2·(√(0.5² + 0.001²) − 0.5) ≈ 2.0e-6 m (Pythagoras), far below a 6.4 m resolution.
    const shortening = 2 * (Math.hypot(0.5, 0.001) - 0.5);
    const r = chamberlinDepth(5e-4, shortening, 6.4);
    expect(r).toEqual({ depth: null, reason: { kind: 'not-meaningful', shortening, resolution: 6.4 } });
    expect(chamberlinReasonText(r.reason!, 'm')).toBe('not meaningful: the bed is only 2e\u22126 m longer than its regional, less than the 6.4 m the digitising resolves');
  });

  it('is A / (L − W)', () => {
    // Source: Chamberlin (1910), H = A / (L − W) (docs/method.md §Chamberlin depth).
    expect(chamberlinDepth(2e6, 11_000 - 10_000)).toEqual({ depth: 2000, reason: null });
  });
  it('holds in extension, where the lost area and the bed length lost to the gaps are both negative', () => {
    // H = A / (L − W) with A < 0 and L − W < 0: the same quotient, a positive height (our inference from the
    // definitions: area and length lost below the regional, after Groshong (1994), Tectonics 13, lost area).
    expect(chamberlinDepth(-2e6, 9_000 - 10_000)).toEqual({ depth: 2000, reason: null });
  });
  it('gives no depth, with the reason, when L = W, when A and L − W differ in sign, when |L − W| is below the resolution, or an input is not finite', () => {
    expect(chamberlinDepth(1e6, 0)).toEqual({ depth: null, reason: { kind: 'equal-lengths' } });
    expect(chamberlinDepth(1e6, -1000)).toEqual({ depth: null, reason: { kind: 'shorter-but-lifted' } });
    expect(chamberlinDepth(-1e6, 1000)).toEqual({ depth: null, reason: { kind: 'longer-but-lost' } });
    expect(chamberlinDepth(Number.NaN, 1000)).toEqual({ depth: null, reason: { kind: 'not-finite' } });
    const shorter = chamberlinDepth(-5, -2.5e-10, 2.5);
    expect(chamberlinReasonText(shorter.reason!, 'm')).toBe('not meaningful: the bed is only 2.5e\u221210 m shorter than its regional, less than the 2.5 m the digitising resolves');
    const longer = chamberlinDepth(5, 2.5e-10, 2.5);
    expect(longer.depth).toBeNull();
    expect(chamberlinReasonText(longer.reason!, 'ft')).toBe('not meaningful: the bed is only 2.5e\u221210 ft longer than its regional, less than the 2.5 ft the digitising resolves');
    // At the resolution itself the shortening is resolved: the rule is |L − W| < resolution.
    expect(chamberlinDepth(5, 2.5, 2.5)).toEqual({ depth: 2, reason: null });
  });
});

// A sin² bump z = a·sin²(πx/λ) over one wavelength λ (flat regional z = 0): for a ≪ λ the arc length exceeds
// λ by ∫ ½ z′² dx = a²π²/(4λ) (small-slope series of the arc-length integral, √(1 + s²) ≈ 1 + s²/2; analytic),
// and its excess area is aλ/2. At a = 1 mm over λ = 10 km, L − W ≈ 2.47e-10 m while L itself is 10⁴ m: two long
// sums would lose it in their last digits, and A / (L − W) ≈ 2e10 m would be shown as a depth.
function bump(a: number, lambda: number, n: number): Section {
  const line: [number, number][] = [];
  for (let i = 0; i <= n; i++) {
    const x = (lambda * i) / n;
    line.push([x, a * Math.sin((Math.PI * x) / lambda) ** 2]);
  }
  return { units: 'm', pins: [0, lambda], referenceElevation: 0, horizons: [{ name: 'Bump', line, regional: [[0, 0], [lambda, 0]] }] };
}

describe('Chamberlin depth of a nearly flat bed', () => {
  it('lengthBeyondSpan gives L − W of a 1 mm bump over 10 km to the analytic a²π²/(4λ), without cancellation', () => {
    const s = bump(1e-3, 10_000, 4000);
    const [xs, zs] = [s.horizons[0].line!.map((p) => p[0]), s.horizons[0].line!.map((p) => p[1])];
    const expected = (1e-3 ** 2 * Math.PI ** 2) / (4 * 10_000);
    expect(Math.abs(lengthBeyondSpan(xs, zs) / expected - 1)).toBeLessThan(1e-5);
    // The same bump 10⁶ times larger (a = 1 km over 10⁷ m): the rule scales as a²/λ, so the sum does too.
    const big = bump(1000, 1e7, 4000);
    const bigExpected = (1000 ** 2 * Math.PI ** 2) / (4 * 1e7);
    expect(Math.abs(lengthBeyondSpan(big.horizons[0].line!.map((p) => p[0]), big.horizons[0].line!.map((p) => p[1])) / bigExpected - 1)).toBeLessThan(1e-5);
  });

  it('the analysis gives no Chamberlin depth for it, "not meaningful" with the reason, instead of ~10¹⁰ m', () => {
    const out = analyseSection(bump(1e-3, 10_000, 4000));
    if (!out.ok) throw new Error(out.problems[0].message);
    const h = out.analysis.horizons[0];
    expect(h.excessArea).toBeCloseTo(1e-3 * 10_000 / 2, 9);
    expect(h.chamberlinDepth).toBeNull();
    // No resolution stated: 10⁻⁴ of the 10 km pin width, 1 m (digitisingResolution).
    expect(chamberlinReasonText(h.chamberlinReason!, 'm')).toBe('not meaningful: the bed is only 2.5e\u221210 m longer than its regional, less than the 1 m the digitising resolves');
    expect(analysisNotes(out.analysis)).toContain('No Chamberlin depth for "Bump": not meaningful: the bed is only 2.5e\u221210 m longer than its regional, less than the 1 m the digitising resolves.');
  });

  it('a bump large enough to digitise keeps its depth A / (L − W) from the same sums', () => {
    // a = 200 m over λ = 10 km: L − W ≈ a²π²/(4λ) = 9.87 m (plus O(a⁴) terms), A = aλ/2 = 10⁶ m².
    const out = analyseSection({ ...bump(200, 10_000, 4000), resolution: 2.5 });
    if (!out.ok) throw new Error(out.problems[0].message);
    const h = out.analysis.horizons[0];
    expect(h.chamberlinReason).toBeNull();
    expect(h.chamberlinDepth! * (h.bedLength - h.regionalLength)).toBeCloseTo(h.excessArea, 3);
    expect(h.chamberlinDepth!).toBeGreaterThan(1e6 / 9.87 * 0.99);
    expect(h.chamberlinDepth!).toBeLessThan(1e6 / 9.87 * 1.01);
  });
});

describe('layerParallelStrain(L, W, D)', () => {
  it('is L / (W + D) − 1, negative when the layer shortened', () => {
    // Source: Groshong (2006) §11.4.3.2, e = L/(W + D) − 1 (docs/method.md §Layer-parallel strain).
    expect(layerParallelStrain(10_450, 10_000, 1000)).toBe(10_450 / 11_000 - 1);
    expect(layerParallelStrain(11_000, 10_000, 1000)).toBe(0);
  });
  it('is null when W + D ≤ 0', () => {
    expect(layerParallelStrain(100, 50, -60)).toBeNull();
  });
});

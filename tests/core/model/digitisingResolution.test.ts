// The one rule for the digitising resolution (docs/method.md §Digitising resolution) and what it does to the
// Chamberlin verdict of a section that states no resolution. Check values: a symmetric triangle fold of base b
// and height h over a flat regional has L − W = 2·√((b/2)² + h²) − b and A = b·h/2 (plane geometry, analytic).
import { describe, expect, it } from 'vitest';
import { analyseSection } from '../../../src/core/analysis/analyseSection';
import { digitisingResolution, RESOLUTION_SHARE_OF_WIDTH } from '../../../src/core/model/digitisingResolution';
import type { Section } from '../../../src/core/model/section';
import { validateSection } from '../../../src/core/model/validateSection';

describe('digitisingResolution', () => {
  it('takes the coarser of a stated resolution and one scan pixel, whichever are known', () => {
    expect(digitisingResolution({ stated: 0.5, pinWidth: 10_000 })).toBe(0.5);
    expect(digitisingResolution({ scanPixel: 2.5, pinWidth: 10_000 })).toBe(2.5);
    expect(digitisingResolution({ stated: 0.5, scanPixel: 2.5, pinWidth: 10_000 })).toBe(2.5);
    expect(digitisingResolution({ stated: 4, scanPixel: 2.5, pinWidth: 10_000 })).toBe(4);
  });
  it('without either, is 10⁻⁴ of the pin width, whatever the unit or the pins’ order', () => {
    expect(RESOLUTION_SHARE_OF_WIDTH).toBe(1e-4);
    expect(digitisingResolution({ pinWidth: 10_000 })).toBe(1);
    expect(digitisingResolution({ pinWidth: -32_808.4 })).toBe(3.28084);
    expect(digitisingResolution({ stated: -1, scanPixel: Number.NaN, pinWidth: 8000 })).toBe(0.8);
    expect(digitisingResolution({ pinWidth: Number.NaN })).toBe(0);
  });
  it('keeps six significant figures, so the value a section file is given is the value used', () => {
    const r = digitisingResolution({ scanPixel: 2.123456789, pinWidth: 1 });
    expect(r).toBe(2.12346);
    expect(digitisingResolution({ stated: r, pinWidth: 1 })).toBe(r);
  });
});

/** Pins 0 and 10 000 m (so 1 m without a stated resolution); one triangle fold of base 1000 m and height `h` m. */
function fold(h: number, scale = 1, resolution?: number): Section {
  const s = (p: [number, number]): [number, number] => [p[0] * scale, p[1] * scale];
  return {
    units: 'm', pins: [0, 10_000 * scale], ...(resolution !== undefined ? { resolution } : {}),
    horizons: [{ name: 'Fold', line: [s([-100, 0]), s([4500, 0]), s([5000, h]), s([5500, 0]), s([10_100, 0])], regional: [s([-100, 0]), s([10_100, 0])] }],
  };
}

function chamberlin(section: Section) {
  const out = analyseSection(section);
  if (!out.ok) throw new Error(out.problems[0].message);
  return out.analysis.horizons[0];
}

describe('a section that states no resolution: the Chamberlin verdict either side of 10⁻⁴ W₀', () => {
  // h = 22 m: L − W = 2·√(500² + 22²) − 1000 = 0.96753 m, below 1 m; h = 23 m: 1.05744 m, above it.
  const below = 2 * Math.hypot(500, 22) - 1000;
  const above = 2 * Math.hypot(500, 23) - 1000;
  it('is "not meaningful" just below and a depth A / (L − W) just above', () => {
    expect(below).toBeCloseTo(0.96753, 5);
    expect(above).toBeCloseTo(1.05744, 5);
    const no = chamberlin(fold(22));
    expect(no.chamberlinDepth).toBeNull();
    expect(no.chamberlinReason).toEqual({ kind: 'not-meaningful', shortening: expect.closeTo(below, 9), resolution: 1 });
    const yes = chamberlin(fold(23));
    expect(yes.chamberlinReason).toBeNull();
    expect(yes.chamberlinDepth!).toBeCloseTo((1000 * 23) / 2 / above, 6);
  });
  it('gives the same verdicts with every coordinate scaled by 10⁻⁶ or 10⁴ (the rule scales with W₀; 10⁶ would pass the ±10⁹ coordinate limit)', () => {
    for (const k of [1e-6, 1e4]) {
      expect(chamberlin(fold(22, k)).chamberlinReason?.kind).toBe('not-meaningful');
      const yes = chamberlin(fold(23, k));
      expect(yes.chamberlinDepth! / k).toBeCloseTo((1000 * 23) / 2 / above, 4);
    }
  });
  it('follows a stated resolution instead, when the file gives one', () => {
    expect(chamberlin(fold(22, 1, 0.5)).chamberlinDepth).not.toBeNull();
    expect(chamberlin(fold(23, 1, 2)).chamberlinReason?.kind).toBe('not-meaningful');
  });
  it('refuses a resolution that is not a positive number where the file is read, with a clear message', () => {
    for (const bad of [0, -1, 'fine', Number.POSITIVE_INFINITY]) {
      const v = validateSection({ ...fold(23), resolution: bad });
      expect(v.ok).toBe(false);
      if (!v.ok) expect(v.problems[0].message).toMatch(/"resolution" must be a positive number/);
    }
    const kept = validateSection(fold(23, 1, 0.25));
    expect(kept.ok && kept.section.resolution).toBe(0.25);
  });
});

import { describe, expect, it } from 'vitest';
import { prepareHorizon } from '../../../src/core/analysis/prepareHorizon';

// A line that folds back over itself: segment 0–1 is z = −500 from x = 0 to 6000; segment 2–3 runs
// (6000, 0) → (4000, −600) and reaches z = −500 at 5/6 of its length, x = 6000 − 2000·5/6 = 4333.33 (analytic).
const lineX = [0, 6000, 6000, 4000, 10_000];
const lineZ = [-500, -500, 0, -600, -500];
const flatX = [0, 10_000];
const flatZ = [-500, -500];

function message(units?: 'm' | 'ft'): string {
  const p = prepareHorizon('H1', lineX, lineZ, flatX, flatZ, [0, 10_000], true, undefined, units);
  if (p.ok) throw new Error('expected a self-crossing problem');
  expect(p.problems.map((q) => q.code)).toEqual(['self-intersecting']);
  return p.problems[0].message;
}

describe('prepareHorizon(...) self-crossing message', () => {
  it('gives the crossing point of the two segments, with the unit when given', () => {
    expect(message('ft')).toBe('Horizon "H1": the line crosses itself between the pins (segments 0–1 and 2–3 cross at x ≈ 4333.33 ft); redraw it so it does not cross itself.');
  });

  it('gives no unit when none is given', () => {
    expect(message()).toContain('cross at x ≈ 4333.33);');
  });

  it('gives an end inside both segments when they overlap along one line', () => {
    // Segment 0–1 runs along z = 0 from 0 to 6000; the line comes back along z = 0 from 3000 to 2000
    // (segment 4–5) and first meets segment 0–1 where segment 3–4 comes down onto it at x = 3000.
    const xs = [0, 6000, 6000, 3000, 3000, 2000, 2000, 10_000];
    const zs = [0, 0, 100, 100, 0, 0, -100, -100];
    const p = prepareHorizon('H1', xs, zs, flatX, flatZ, [0, 10_000]);
    expect(p.ok).toBe(false);
    if (p.ok) return;
    const m = /segments (\d+)–\d+ and (\d+)–\d+ cross at x ≈ ([\d.]+)/.exec(p.problems[0].message);
    expect(m).not.toBeNull();
    const x = Number(m![3]);
    // Wherever the first pair found lies, the point is on segment 0–1 and on the line's way back (2000 ≤ x ≤ 3000).
    expect(m![1]).toBe('0');
    expect(x).toBeGreaterThanOrEqual(2000);
    expect(x).toBeLessThanOrEqual(3000);
  });
});

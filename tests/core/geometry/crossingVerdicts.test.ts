// Long lines handed to another thread for the self-crossing test: measured meanwhile, the verdict kept by the line's
// content, and a line that crosses itself left out once its verdict is in. The independent check of "crosses" is
// @turf/kinks (a general-purpose library from the registry); "cannot cross" is the analytic fact that a line along
// which z falls at every vertex meets each level once, so no two of its segments cross.
import { lineString } from '@turf/helpers';
import kinks from '@turf/kinks';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { crossingKey, crossingVerdict, crossingVerdictsVersion, recordCrossingVerdict, setCrossingDeferral } from '../../../src/core/geometry/crossingVerdicts';
import { sweepSelfCrossing } from '../../../src/core/geometry/sweepSelfCrossing';
import { prepareHorizon } from '../../../src/core/analysis/prepareHorizon';

/** A steep limb of n vertices (z falls at every vertex, x wavers), with, when `loop`, a stretch near its middle thrown back across the limb. */
function limb(n: number, loop: boolean): { xs: number[]; zs: number[] } {
  const xs: number[] = [-100, 1000], zs: number[] = [0, 0];
  for (let i = 1; i <= n; i++) {
    xs.push(1000 + (500 * i) / n + 0.3 * Math.sin(i * 0.7));
    zs.push(-(2000 * i) / (n + 1));
  }
  if (loop) {
    const m = 2 + Math.floor(n / 2);
    // Back up above the vertex two before, then on down past it: the segment m → m + 1 crosses segment m − 2 → m − 1.
    zs[m] = zs[m - 3] + 1;
    xs[m] = xs[m - 2] - 5;
    xs[m + 1] = xs[m - 2] + 5;
  }
  xs.push(3100);
  zs.push(-2000);
  return { xs, zs };
}

const REGIONAL = { x: [-100, 3100], z: [-1000, -1000] };
const prepare = (l: { xs: number[]; zs: number[] }) => prepareHorizon('Limb', l.xs, l.zs, REGIONAL.x, REGIONAL.z, [0, 3000]);
const kinked = (l: { xs: number[]; zs: number[] }) => kinks(lineString(l.xs.map((x, i) => [x, l.zs[i]]))).features.length > 0;

describe('crossingVerdicts', () => {
  afterEach(() => setCrossingDeferral(null));

  it('the test lines are what they claim (turf kinks)', () => {
    expect(kinked(limb(3000, true))).toBe(true);
    expect(kinked(limb(3000, false))).toBe(false);
  });

  it('without a helper every line is tested at once, as sweepSelfCrossing', () => {
    const l = limb(3000, true);
    expect(crossingVerdict(l.xs, l.zs)).toEqual(sweepSelfCrossing(l.xs, l.zs));
    const p = prepare(l);
    expect(p.ok).toBe(false);
    if (!p.ok) expect(p.problems.map((q) => q.code)).toEqual(['self-intersecting']);
  });

  it('hands a long line out once, measures it meanwhile, and leaves it out when the verdict says it crosses', () => {
    const defer = vi.fn();
    setCrossingDeferral(defer, 2000);
    const l = limb(3000, true);
    const before = prepare(l);
    expect(before.ok).toBe(true);
    // Asked again before the answer (another edit, another view): not handed out twice.
    expect(prepare({ xs: [...l.xs], zs: [...l.zs] }).ok).toBe(true);
    expect(defer).toHaveBeenCalledTimes(1);
    const [key, xs, zs] = defer.mock.calls[0] as [string, Float64Array, Float64Array];
    const version = crossingVerdictsVersion();
    recordCrossingVerdict(key, sweepSelfCrossing(xs, zs));
    // A crossing changes what was measured meanwhile: results remembered by the version are out of date.
    expect(crossingVerdictsVersion()).toBeGreaterThan(version);
    // The verdict belongs to the content: a fresh copy of the same line gets it without being handed out again.
    const after = prepare({ xs: [...l.xs], zs: [...l.zs] });
    expect(after.ok).toBe(false);
    if (!after.ok) expect(after.problems[0].message).toMatch(/crosses itself between the pins/);
    expect(defer).toHaveBeenCalledTimes(1);
  });

  it('keeps a line that does not cross itself once its verdict is in, and tests short lines at once', () => {
    const defer = vi.fn();
    setCrossingDeferral(defer, 2000);
    const l = limb(3000, false);
    expect(prepare(l).ok).toBe(true);
    const [key, xs, zs] = defer.mock.calls[0] as [string, Float64Array, Float64Array];
    const version = crossingVerdictsVersion();
    recordCrossingVerdict(key, sweepSelfCrossing(xs, zs));
    // Measured meanwhile as not crossing, which it does not: what was computed then stands, the version with it.
    expect(crossingVerdictsVersion()).toBe(version);
    expect(prepare(l).ok).toBe(true);
    const short = limb(1000, true);
    expect(kinked(short)).toBe(true);
    expect(prepare(short).ok).toBe(false);
    expect(defer).toHaveBeenCalledTimes(1);
  });

  it('crossingKey tells lines apart by every coordinate, and not by the array they are in', () => {
    const l = limb(3000, false);
    const k = crossingKey(l.xs, l.zs);
    expect(crossingKey(Float64Array.from(l.xs), Float64Array.from(l.zs))).toBe(k);
    const moved = [...l.zs];
    moved[1500] += 1e-9;
    expect(crossingKey(l.xs, moved)).not.toBe(k);
    expect(crossingKey(l.zs, l.xs)).not.toBe(k);
  });
});

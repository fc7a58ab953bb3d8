import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { clipAndMeasure } from '../../../src/core/geometry/clipAndMeasure';
import { polylineLength } from '../../../src/core/geometry/polylineLength';
import { trapezoidIntegral } from '../../../src/core/geometry/trapezoidIntegral';
import { xMonotoneChains } from '../../../src/core/geometry/xMonotoneChains';

// --- A plain two-pass reference, written here: find every contact with each pin first, then cut. ---

interface Contact { seg: number; t: number; first: number; last: number }

function contacts(xs: number[], p: number): Contact[] {
  const side = (x: number) => (x < p ? -1 : x > p ? 1 : 0);
  const out: Contact[] = [];
  let prev = side(xs[0]);
  let run = prev === 0 ? 0 : -1;
  for (let i = 1; i < xs.length; i++) {
    const s = side(xs[i]);
    if (s === prev) continue;
    if (s === 0) run = i;
    else if (prev === 0) out.push({ seg: -1, t: 0, first: run, last: i - 1 });
    else out.push({ seg: i - 1, t: (p - xs[i - 1]) / (xs[i] - xs[i - 1]), first: -1, last: -1 });
    prev = s;
  }
  if (prev === 0) out.push({ seg: -1, t: 0, first: run, last: xs.length - 1 });
  return out;
}

function referenceClip(xs0: number[], zs0: number[], pL: number, pR: number, flags0: number[]) {
  let [xs, zs, flags] = [xs0, zs0, flags0];
  let l = contacts(xs, pL);
  let r = contacts(xs, pR);
  const counts = [l.length, r.length];
  if (l.length !== 1 || r.length !== 1) return { counts, clipped: null };
  const pos = (c: Contact) => (c.seg >= 0 ? c.seg + c.t : c.first);
  const reversed = pos(l[0]) > pos(r[0]);
  if (reversed) {
    [xs, zs, flags] = [[...xs].reverse(), [...zs].reverse(), [...flags].reverse()];
    [l, r] = [contacts(xs, pL), contacts(xs, pR)];
  }
  const [a, b] = [l[0], r[0]];
  const outX = [pL];
  const outZ = [a.seg >= 0 ? zs[a.seg] + a.t * (zs[a.seg + 1] - zs[a.seg]) : zs[a.last]];
  const source = [a.seg >= 0 ? a.seg + a.t : a.last];
  for (let i = a.seg >= 0 ? a.seg + 1 : a.last + 1; i <= (b.seg >= 0 ? b.seg : b.first - 1); i++) {
    outX.push(xs[i]);
    outZ.push(zs[i]);
    source.push(i);
  }
  outX.push(pR);
  outZ.push(b.seg >= 0 ? zs[b.seg] + b.t * (zs[b.seg + 1] - zs[b.seg]) : zs[b.first]);
  source.push(b.seg >= 0 ? b.seg + b.t : b.first);
  const start = a.seg >= 0 ? a.seg : a.last;
  const projected = outX.slice(1).map((_, k) => (flags[start + k] ? 1 : 0));
  const n = xs.length;
  return { counts, clipped: { xs: outX, zs: outZ, source: reversed ? source.map((s) => n - 1 - s) : source, projected, reversed } };
}

// Lines on a coarse grid so that vertices often fall exactly on a pin (touches, runs along it) and repeat.
const line = fc.array(fc.tuple(fc.integer({ min: -2, max: 12 }), fc.integer({ min: -5, max: 5 }), fc.boolean()), { minLength: 2, maxLength: 30 });

describe('clipAndMeasure(xs, zs, pL, pR, flags, zOrigin)', () => {
  it('clips exactly as a plain two-pass clip (contacts first, then cut), on lines that touch and run along the pins (property)', () => {
    fc.assert(fc.property(line, (pts) => {
      const xs = pts.map((p) => p[0]);
      const zs = pts.map((p) => p[1] + p[0] / 7);
      const flags = pts.slice(1).map((p) => (p[2] ? 1 : 0));
      const ours = clipAndMeasure(xs, zs, 0, 10, flags);
      const ref = referenceClip(xs, zs, 0, 10, flags);
      expect([ours.clip.leftContacts, ours.clip.rightContacts]).toEqual(ref.counts);
      const c = ours.clip.clipped;
      if (!ref.clipped || !c) {
        expect(c).toBeNull();
        expect(ref.clipped).toBeNull();
        return;
      }
      expect({ xs: Array.from(c.xs), zs: Array.from(c.zs), source: Array.from(c.source), projected: Array.from(c.projected), reversed: c.reversed }).toEqual(ref.clipped);
    }), { numRuns: 2000 });
  });

  it('measures the clipped line bit for bit as trapezoidIntegral, polylineLength and xMonotoneChains do (property)', () => {
    const origin = fc.option(fc.integer({ min: -5, max: 5 }), { nil: undefined });
    fc.assert(fc.property(line, origin, (pts, z0) => {
      const xs = pts.map((p) => p[0] * 1000 + 1e6);
      const zs = pts.map((p) => p[1] * 37.5 - 2500);
      const m = clipAndMeasure(xs, zs, 1e6, 1e6 + 10_000, undefined, z0);
      const c = m.clip.clipped;
      if (!c) return;
      const zOrigin = z0 ?? c.zs[0];
      expect(m.zOrigin).toBe(zOrigin);
      expect(m.integral).toBe(trapezoidIntegral(c.xs, c.zs, zOrigin));
      expect(m.length).toBe(polylineLength(c.xs, c.zs));
      expect(m.chains).toEqual(xMonotoneChains(c.xs, c.zs));
      expect(m.xMonotone).toBe(m.chains.count === 1);
    }), { numRuns: 1000 });
  });

  it('gives the analytic loop integral of a line that crosses the pins (worked by hand)', () => {
    // z = x/2 + 5 between x = 0 and x = 6: ∫ (z − 5) dx = 6²/4 = 9, length = 6·√(1 + 1/4).
    const m = clipAndMeasure([-10, 2, 10], [0, 6, 10], 0, 6, undefined, 5);
    expect(m.integral).toBeCloseTo(9, 12);
    expect(m.length).toBeCloseTo(6 * Math.sqrt(1.25), 12);
    expect(m.xMonotone).toBe(true);
  });

  it('reports the contact counts and no measures for a line that misses a pin', () => {
    const m = clipAndMeasure([1, 5, 12], [0, 0, 0], 0, 10);
    expect([m.clip.leftContacts, m.clip.rightContacts, m.clip.clipped, m.integral, m.length]).toEqual([0, 1, null, 0, 0]);
  });
});

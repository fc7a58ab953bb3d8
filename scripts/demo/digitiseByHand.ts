// The demo's lines as a person digitises them from the scan: a vertex every so many scan pixels along
// the drawn line (and at every sharp bend, where a careful hand puts one), each off the ink by seeded
// Gaussian jitter in scan pixels, then read back into section units through the calibration. The scan
// itself is drawn from the exact lines; only what is "clicked" carries the digitising error. Where the land
// surface cuts a horizon, the hand clicks the outcrop on each side and follows the dashed projected line
// between them, and that stretch is marked projected.
import { seededRandom } from '../../src/core/stats/seededRandom';
import type { LineSection as Section, XZ } from '../../src/core/model/section';
import { apply, type Affine } from './layout';
import { highestZAt } from './topography';

export interface HandOptions {
  /** Distance between clicks along the drawn line, scan pixels. */
  spacingPx: number;
  /** Standard deviation of each click's error in u and in v, scan pixels. */
  jitterPx: number;
  /** A vertex is always placed where the line turns by more than this (degrees). */
  bendDeg: number;
  seed: number;
}

/** The demo's digitising: a click every 20 scan px (about 250 m), σ = 0.7 px, at bends over 25°. */
export const DEMO_HAND: HandOptions = { spacingPx: 20, jitterPx: 0.7, bendDeg: 25, seed: 1309 };

function turnDeg(a: [number, number], b: [number, number], c: [number, number]): number {
  const t1 = Math.atan2(b[1] - a[1], b[0] - a[0]);
  const t2 = Math.atan2(c[1] - b[1], c[0] - b[0]);
  let d = Math.abs(t2 - t1) * (180 / Math.PI);
  if (d > 180) d = 360 - d;
  return d;
}

/** Returns the line's clicks in scan pixels (before jitter): ends, sharp bends, the points marked `must`, and every spacingPx of arc between. */
export function clicksAlong(px: [number, number][], must: boolean[], o: HandOptions): [number, number][] {
  const out: [number, number][] = [px[0]];
  let since = 0;
  for (let i = 1; i < px.length; i++) {
    const [a, b] = [px[i - 1], px[i]];
    const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
    let t = o.spacingPx - since;
    while (t < len) {
      out.push([a[0] + ((b[0] - a[0]) * t) / len, a[1] + ((b[1] - a[1]) * t) / len]);
      t += o.spacingPx;
    }
    since = len - (t - o.spacingPx);
    const sharp = i + 1 < px.length && turnDeg(a, b, px[i + 1]) > o.bendDeg;
    if (i === px.length - 1 || must[i] || (sharp && since > o.spacingPx / 4)) {
      // A click forced at an outcrop replaces a spacing click that fell just before it.
      if (must[i] && since < o.spacingPx / 4 && out.length > 1) out.pop();
      out.push(b);
      since = 0;
    }
  }
  return out;
}

/** Returns the line (section units) with a vertex inserted wherever it crosses the surface, and which vertices are those outcrops. */
function withOutcrops(line: XZ[], surface: XZ[]): { line: XZ[]; outcrop: boolean[] } {
  const above = (q: XZ): number => q[1] - highestZAt(surface, q[0]);
  const out: XZ[] = [line[0]];
  const outcrop: boolean[] = [false];
  for (let i = 1; i < line.length; i++) {
    const [p, q] = [line[i - 1], line[i]];
    if (above(p) * above(q) < 0) {
      // Bisection on the segment: the surface is piecewise linear, so 50 halvings reach the metre's 1e-12.
      let [lo, hi] = [0, 1];
      for (let k = 0; k < 50; k++) {
        const mid = (lo + hi) / 2;
        const m: XZ = [p[0] + mid * (q[0] - p[0]), p[1] + mid * (q[1] - p[1])];
        if (above(m) * above(p) > 0) lo = mid;
        else hi = mid;
      }
      out.push([p[0] + lo * (q[0] - p[0]), p[1] + lo * (q[1] - p[1])]);
      outcrop.push(true);
    }
    out.push(q);
    outcrop.push(false);
  }
  return { line: out, outcrop };
}

/** Returns the runs [from, to] of clicks that lie on the projected line: from an outcrop over the eroded part to the next. */
function projectedRuns(clicks: XZ[], surface: XZ[]): [number, number][] {
  // An outcrop click sits on the surface to rounding, so the test allows half a metre.
  const [x0, x1] = [surface[0][0], surface[surface.length - 1][0]];
  const inAir = clicks.map((q) => q[1] > highestZAt(surface, Math.min(x1, Math.max(x0, q[0]))) - 0.5);
  const runs: [number, number][] = [];
  let start = -1;
  inAir.forEach((up, i) => {
    if (up && start < 0) start = i;
    if ((!up || i === inAir.length - 1) && start >= 0) {
      const end = up ? i : i - 1;
      if (end > start) runs.push([start, end]);
      start = -1;
    }
  });
  return runs;
}

/**
 * Returns the section with each horizon's line digitised by hand from the scan (regionals, pins and names kept);
 * with a land surface, the stretches above it are clicked on the projected line and marked projected.
 */
export function digitiseByHand(section: Section, toImage: Affine, toSection: Affine, surface: XZ[] = [], o: HandOptions = DEMO_HAND): Section {
  const rnd = seededRandom(o.seed);
  const round = (v: number) => Math.round(v * 100) / 100;
  return {
    ...section,
    horizons: section.horizons.map((h) => {
      // Jitter would move a piece's end off its fault, so only unbroken lines are digitised this way.
      if (!h.line) throw new Error(`digitiseByHand: horizon "${h.name}" is in pieces; only unbroken lines are digitised by hand`);
      const cut = surface.length ? withOutcrops(h.line, surface) : { line: h.line, outcrop: h.line.map(() => false) };
      const px = cut.line.map((q) => apply(toImage, q));
      const clicks = clicksAlong(px, cut.outcrop, o);
      const runs = surface.length ? projectedRuns(clicks.map((c) => apply(toSection, c)), surface) : [];
      const line: XZ[] = clicks.map(([u, v]) => {
        const [x, z] = apply(toSection, [u + o.jitterPx * rnd.normal(), v + o.jitterPx * rnd.normal()]);
        return [round(x), round(z)];
      });
      return runs.length ? { ...h, line, projected: runs } : { ...h, line };
    }),
  };
}

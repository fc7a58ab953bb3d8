// The demo's lines as a person digitises them from the scan: a vertex every so many scan pixels along
// the drawn line (and at every sharp bend, where a careful hand puts one), each off the ink by seeded
// Gaussian jitter in scan pixels, then read back into section units through the calibration. The scan
// itself is drawn from the exact lines; only what is "clicked" carries the digitising error.
import { seededRandom } from '../../src/core/stats/seededRandom';
import type { LineSection as Section, XZ } from '../../src/core/model/section';
import { apply, type Affine } from './layout';

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

/** Returns the line's clicks in scan pixels (before jitter): ends, sharp bends, and every spacingPx of arc between. */
function clicksAlong(px: [number, number][], o: HandOptions): [number, number][] {
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
    if (i === px.length - 1 || (sharp && since > o.spacingPx / 4)) {
      out.push(b);
      since = 0;
    }
  }
  return out;
}

/** Returns the section with each horizon's line digitised by hand from the scan (regionals, pins and names kept). */
export function digitiseByHand(section: Section, toImage: Affine, toSection: Affine, o: HandOptions = DEMO_HAND): Section {
  const rnd = seededRandom(o.seed);
  const round = (v: number) => Math.round(v * 100) / 100;
  return {
    ...section,
    horizons: section.horizons.map((h) => {
      // Jitter would move a piece's end off its fault, so only unbroken lines are digitised this way.
      if (!h.line) throw new Error(`digitiseByHand: horizon "${h.name}" is in pieces; only unbroken lines are digitised by hand`);
      const px = h.line.map((q) => apply(toImage, q));
      const clicks = clicksAlong(px, o);
      const line: XZ[] = clicks.map(([u, v]) => {
        const [x, z] = apply(toSection, [u + o.jitterPx * rnd.normal(), v + o.jitterPx * rnd.normal()]);
        return [round(x), round(z)];
      });
      return { ...h, line };
    }),
  };
}

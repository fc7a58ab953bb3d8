// Where drawn lines meet: a click on a junction (a horizon ending on the border or on another line, an outcrop
// where a horizon meets the land surface, a drawn cross) belongs at the point where the lines' centres cross,
// not at the centroid of the ink blob there, which an arm ending at the junction pulls towards itself.
// The arms are read on a circle around the blob (the ridges of darkness it crosses), each arm's centre line from
// two centres across it (centreAcross), and the junction is where two arms that are not one straight line cross.
import { centreAcross, INK_CONTRAST } from './centreAcross';
import type { PixelFeatures } from './pixelFeatures';
import { sampleBilinear } from './sampleBilinear';

const RING_STEPS = 90;
/** Arms closer than this to a straight continuation of each other (radians) are one line. */
const SAME_LINE_RAD = 0.5;

interface Arm { strength: number; px: number; py: number; dx: number; dy: number }

function armsAround(f: PixelFeatures, cx: number, cy: number, ringPx: number): Arm[] {
  const ring = new Float64Array(RING_STEPS);
  let lo = Infinity;
  for (let s = 0; s < RING_STEPS; s++) {
    const a = (2 * Math.PI * s) / RING_STEPS;
    ring[s] = sampleBilinear(f.dark, f, cx + ringPx * Math.cos(a), cy + ringPx * Math.sin(a));
    if (ring[s] < lo) lo = ring[s];
  }
  const arms: Arm[] = [];
  for (let s = 0; s < RING_STEPS; s++) {
    const v = ring[s];
    if (v - lo < INK_CONTRAST || v < ring[(s + RING_STEPS - 1) % RING_STEPS] || v <= ring[(s + 1) % RING_STEPS]) continue;
    // The arm's centre line: centres across it at two distances from the blob.
    const a = (2 * Math.PI * s) / RING_STEPS;
    const ends: [number, number][] = [];
    for (const r of [ringPx * 0.6, ringPx]) {
      const x = cx + r * Math.cos(a);
      const y = cy + r * Math.sin(a);
      const o = centreAcross(f, x, y, -Math.sin(a), Math.cos(a), Math.min(4, ringPx * 0.4));
      if (Number.isNaN(o)) break;
      ends.push([x - o * Math.sin(a), y + o * Math.cos(a)]);
    }
    if (ends.length < 2) continue;
    const dx = ends[1][0] - ends[0][0];
    const dy = ends[1][1] - ends[0][1];
    const len = Math.hypot(dx, dy);
    if (len > 0) arms.push({ strength: v - lo, px: ends[0][0], py: ends[0][1], dx: dx / len, dy: dy / len });
  }
  return arms.sort((p, q) => q.strength - p.strength);
}

/**
 * Returns the point where the centre lines of two drawn lines meeting near (cx, cy) cross (image px), read from the
 * arms of ink leaving a circle of `ringPx` around it (the two darkest arms at an angle when more leave it); null when fewer than two arms that are not one straight line
 * leave it (a plain line, paper), or the crossing lies farther than `ringPx` from (cx, cy).
 */
export function junctionCentre(f: PixelFeatures, cx: number, cy: number, ringPx: number): [number, number] | null {
  const arms = armsAround(f, cx, cy, ringPx);
  for (let i = 0; i < arms.length; i++) {
    for (let j = i + 1; j < arms.length; j++) {
      const a = arms[i];
      const b = arms[j];
      // Two arms of one straight line point opposite ways; two of different lines meet at an angle.
      const cos = a.dx * b.dx + a.dy * b.dy;
      if (cos < -Math.cos(SAME_LINE_RAD) || cos > Math.cos(SAME_LINE_RAD)) continue;
      const det = a.dx * b.dy - a.dy * b.dx;
      const t = ((b.px - a.px) * b.dy - (b.py - a.py) * b.dx) / det;
      const x = a.px + t * a.dx;
      const y = a.py + t * a.dy;
      // The two strongest arms at an angle: fainter ones are more often a tick or a letter beside the junction.
      return Math.hypot(x - cx, y - cy) <= ringPx ? [x, y] : null;
    }
  }
  return null;
}

// One traced stretch, from the tree of its first anchor to its second: the least-cost pixel path, moved
// onto the line centre and simplified, ending exactly on both anchors so consecutive stretches join.
import { PROFILE_HALF_PX } from './centreAcross';
import type { PixelFeatures } from './pixelFeatures';
import { pathToSource, type PathTree } from './shortestPathTree';
import { refineToCentre, type CentreCache } from './refineToCentre';
import { simplifyPolyline } from './simplifyPolyline';

/** Douglas–Peucker tolerance for traced stretches, in image px: well under a pixel, so the simplified line stays on the ink. */
export const TRACE_TOLERANCE_PX = 0.3;
/** Fraction of a path that must lie on a line (ink or boundary) for it to be followed; below it the stretch is straight. */
export const MIN_ON_LINE = 0.6;
/** Path points nearer an anchor than this (image px, the profile's reach plus one) are left out: see traceStretch. */
export const NEAR_ANCHOR_PX = PROFILE_HALF_PX + 1;
/** A centre on a line wider than WIDE_FACTOR × the stretch's median width + WIDE_SLACK_PX is another line's, or two merged. */
export const WIDE_FACTOR = 1.5;
export const WIDE_SLACK_PX = 0.5;
/** Centres this many path points from a pixel where no line was found are left out: the end of a dash or of a gap's ink. */
export const RUN_END_POINTS = 2;

/** Returns the window pixel index holding image point (x, y), or −1 outside the window. */
export function pixelIndexAt(f: { x0: number; y0: number; w: number; h: number }, x: number, y: number): number {
  const i = Math.floor(x - f.x0);
  const j = Math.floor(y - f.y0);
  return i < 0 || j < 0 || i >= f.w || j >= f.h ? -1 : j * f.w + i;
}

/**
 * Returns the traced stretch from `from` (the tree's source pixel holds it) to `to`, in image px: first point
 * `from`, last point `to`, the vertices between on the line centre, simplified to `tol`. Where the path finds no
 * drawn line along most of its length (less than MIN_ON_LINE: bare paper, a smooth tone) the stretch is straight,
 * [from, to]: there is nothing to follow. `cache` (one per tree) keeps centres found for earlier pointer positions. Returns null when `to` lies outside the tree's window or cannot be reached.
 */
export function traceStretch(tree: PathTree, f: PixelFeatures, from: readonly [number, number], to: readonly [number, number], tol = TRACE_TOLERANCE_PX, cache?: CentreCache): [number, number][] | null {
  const target = pixelIndexAt(f, to[0], to[1]);
  if (target < 0) return null;
  const path = pathToSource(tree, target);
  if (path.length === 0) return null;
  const { points, onLine, found, widthPx } = refineToCentre(path, f, f, cache);
  if (onLine < MIN_ON_LINE) return [[from[0], from[1]], [to[0], to[1]]];
  const keep = ownLineCentres(found, widthPx);
  // The ends are the anchors themselves (already on the line centre when snapped). Between them only the points
  // centred on a line are kept, and none within NEAR_ANCHOR_PX of an anchor: there the profile across the path
  // reaches the anchor's own junction (a horizon ending on a border or another line, the land surface at an
  // outcrop) and a centroid over two inks lies between them; a pixel where no line was found is only where the
  // search stepped. The line runs straight from the anchor to the first centre kept, a few pixels along.
  const pts: [number, number][] = [[from[0], from[1]]];
  const near2 = NEAR_ANCHOR_PX * NEAR_ANCHOR_PX;
  for (let i = 1; i < points.length - 1; i++) {
    if (!keep[i]) continue;
    const [x, y] = points[i];
    const ax = x - from[0], ay = y - from[1], bx = x - to[0], by = y - to[1];
    if (ax * ax + ay * ay < near2 || bx * bx + by * by < near2) continue;
    pts.push(points[i]);
  }
  pts.push([to[0], to[1]]);
  return simplifyPolyline(pts, tol);
}

/**
 * Returns, per path point, whether its centre is kept: found on a line (`found`) no wider than the stretch's own
 * (WIDE_FACTOR × the median width of the found centres + WIDE_SLACK_PX), and at least RUN_END_POINTS points from
 * any point that is not. Where a horizon meets a heavier line at a shallow angle (the land surface where it crops
 * out) the search runs along the heavier line for a few pixels, or through the blob where the two inks merge:
 * those centres are wider than the horizon's and left out, and the line runs straight from the anchor to the
 * first centre on the horizon itself. At the ends of a dash the profile cuts the square end of the ink and its
 * centroid leans off the line; the runs are trimmed there.
 */
export function ownLineCentres(found: Uint8Array, widthPx: Float32Array): Uint8Array {
  const n = found.length;
  let m = 0;
  for (let i = 0; i < n; i++) if (found[i]) m++;
  // A typed array sorts numerically without a comparator: a preview sorts every centre of the path at each move.
  const widths = new Float32Array(m);
  m = 0;
  for (let i = 0; i < n; i++) if (found[i]) widths[m++] = widthPx[i];
  widths.sort();
  const limit = widths.length > 0 ? WIDE_FACTOR * widths[widths.length >> 1] + WIDE_SLACK_PX : Infinity;
  const own = new Uint8Array(n);
  for (let i = 0; i < n; i++) own[i] = found[i] && widthPx[i] <= limit ? 1 : 0;
  // Trim each run of own centres by RUN_END_POINTS at each end (a path end is not a run end: the anchors are kept).
  const keep = new Uint8Array(n);
  let lastGap = -Infinity;
  for (let i = 0; i < n; i++) {
    if (!own[i]) lastGap = i;
    keep[i] = own[i] && i - lastGap > RUN_END_POINTS ? 1 : 0;
  }
  let nextGap = Infinity;
  for (let i = n - 1; i >= 0; i--) {
    if (!own[i]) nextGap = i;
    if (nextGap - i <= RUN_END_POINTS) keep[i] = 0;
  }
  return keep;
}

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
  const { points, onLine, found } = refineToCentre(path, f, f, cache);
  if (onLine < MIN_ON_LINE) return [[from[0], from[1]], [to[0], to[1]]];
  // The ends are the anchors themselves (already on the line centre when snapped). Between them only the points
  // centred on a line are kept, and none within NEAR_ANCHOR_PX of an anchor: there the profile across the path
  // reaches the anchor's own junction (a horizon ending on a border or another line, the land surface at an
  // outcrop) and a centroid over two inks lies between them; a pixel where no line was found is only where the
  // search stepped. The line runs straight from the anchor to the first centre kept, a few pixels along.
  const pts: [number, number][] = [[from[0], from[1]]];
  for (let i = 1; i < points.length - 1; i++) {
    const [x, y] = points[i];
    if (!found[i] || Math.hypot(x - from[0], y - from[1]) < NEAR_ANCHOR_PX || Math.hypot(x - to[0], y - to[1]) < NEAR_ANCHOR_PX) continue;
    pts.push(points[i]);
  }
  pts.push([to[0], to[1]]);
  return simplifyPolyline(pts, tol);
}

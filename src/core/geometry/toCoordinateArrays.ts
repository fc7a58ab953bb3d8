import type { XZ } from '../model/section';

// The analysis runs on typed arrays (allocation-free loops, DEVELOPERS.md §Code style); sections store [x, z] pairs.

/** Separate x and z arrays (units) of the points, in order; empty arrays for no points. */
export function toCoordinateArrays(points: readonly XZ[]): { xs: Float64Array; zs: Float64Array } {
  const xs = new Float64Array(points.length);
  const zs = new Float64Array(points.length);
  for (let i = 0; i < points.length; i++) {
    xs[i] = points[i][0];
    zs[i] = points[i][1];
  }
  return { xs, zs };
}

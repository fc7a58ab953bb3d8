// Min/max decimation of a long line for drawing only (the way plotting libraries reduce a series to
// pixel resolution before drawing it, e.g. uPlot): consecutive vertices that fall in one screen-pixel
// column are replaced by the first, lowest, highest and last of them, in their order along the line.
// Every kept point is an original vertex; segments between columns are original segments, and inside
// a column the kept points sweep the column's whole vertical range, so the drawn line stays within one
// screen pixel of the original. Columns beyond a window (the view and a margin) count as one column on
// each side: what lies there is never seen, so a zoomed-in long line is not drawn whole off screen.
// The document, the tools and the analysis always keep every vertex.

/** Lines with no more vertices than this are drawn as they are: nothing to gain. */
export const DECIMATE_ABOVE_VERTICES = 2048;

/**
 * Returns the flat line [u0, v0, u1, v1, …] (image px) reduced for drawing at `scale` screen px per image px:
 * per run of consecutive vertices in one screen-pixel column (u · scale floored; columns left of `columns[0]` or
 * right of `columns[1]` count as one column each side), its first, lowest, highest and last vertex in line order;
 * at most 4 per run. A line of ≤ 4 vertices, or a scale that is not finite and positive, comes back as a copy.
 */
export function decimatePolyline(flat: ArrayLike<number>, scale: number, columns: readonly [number, number] = [-Infinity, Infinity]): number[] {
  const n = flat.length >> 1;
  if (n <= 4 || !(scale > 0) || !Number.isFinite(scale)) return Array.from(flat);
  const [first, last] = columns;
  const columnOf = (k: number) => {
    const c = Math.floor(flat[2 * k] * scale);
    return c < first ? first - 1 : c > last ? last + 1 : c;
  };
  const out: number[] = [];
  const keep = (k: number) => out.push(flat[2 * k], flat[2 * k + 1]);
  let i = 0;
  while (i < n) {
    // Extend the run while the next vertex lies in the same column; track its lowest and highest vertex.
    const column = columnOf(i);
    let j = i;
    let lo = i;
    let hi = i;
    while (j + 1 < n && columnOf(j + 1) === column) {
      j++;
      const v = flat[2 * j + 1];
      if (v < flat[2 * lo + 1]) lo = j;
      if (v > flat[2 * hi + 1]) hi = j;
    }
    // Emit first, then the extremes in line order, then last, each once.
    const a = Math.min(lo, hi);
    const b = Math.max(lo, hi);
    keep(i);
    if (a > i) keep(a);
    if (b > a) keep(b);
    if (j > b) keep(j);
    i = j + 1;
  }
  return out;
}

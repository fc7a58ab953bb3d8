// Min/max decimation of a long line for drawing only (the way plotting libraries reduce a series to
// pixel resolution before drawing it, e.g. uPlot): consecutive vertices that fall in one screen-pixel
// column are replaced by the first, lowest, highest and last of them, in their order along the line.
// Every kept point is an original vertex; segments between columns are original segments, and inside
// a column the kept points sweep the column's whole vertical range, so the drawn line stays within one
// screen pixel of the original. Columns beyond a window (the view and a margin) count as one column on
// each side: what lies there is never seen, so a zoomed-in long line is not drawn whole off screen.
// The document, the tools and the analysis always keep every vertex.
//
// A line whose head stays while its tail changes (an excess-area fill while its regional is dragged: the
// horizon's part is fixed, the regional's changes) is decimated in two steps with the same result: the
// head once, up to the start of its last run (decimatePrefix), and on every change only that last run and
// the new tail (decimateAfterPrefix). Runs are found left to right, so the runs before the head's last run
// are the same whatever follows it.

/** Lines with no more vertices than this are drawn as they are: nothing to gain. */
export const DECIMATE_ABOVE_VERTICES = 2048;

type Columns = readonly [number, number];

/** Appends to `out` the decimated runs of vertices start … n − 1 of the flat line; returns the index where the last run began. */
function appendRuns(flat: ArrayLike<number>, n: number, start: number, scale: number, columns: Columns, out: number[]): number {
  const [first, last] = columns;
  const columnOf = (k: number) => {
    const c = Math.floor(flat[2 * k] * scale);
    return c < first ? first - 1 : c > last ? last + 1 : c;
  };
  const keep = (k: number) => out.push(flat[2 * k], flat[2 * k + 1]);
  let i = start;
  let lastRun = start;
  while (i < n) {
    lastRun = i;
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
  return lastRun;
}

const usable = (scale: number) => scale > 0 && Number.isFinite(scale);

/**
 * Returns the flat line [u0, v0, u1, v1, …] (image px) reduced for drawing at `scale` screen px per image px:
 * per run of consecutive vertices in one screen-pixel column (u · scale floored; columns left of `columns[0]` or
 * right of `columns[1]` count as one column each side), its first, lowest, highest and last vertex in line order;
 * at most 4 per run. A line of ≤ 4 vertices, or a scale that is not finite and positive, comes back as a copy.
 */
export function decimatePolyline(flat: ArrayLike<number>, scale: number, columns: Columns = [-Infinity, Infinity]): number[] {
  const n = flat.length >> 1;
  if (n <= 4 || !usable(scale)) return Array.from(flat);
  const out: number[] = [];
  appendRuns(flat, n, 0, scale, columns, out);
  return out;
}

/** A line's head decimated up to the start of its last run, and that run's vertices, still to be decimated with what follows. */
export interface DecimatedPrefix { head: ArrayLike<number>; kept: number[]; rest: number[] }

function columnAt(flat: ArrayLike<number>, k: number, scale: number, columns: Columns): number {
  const c = Math.floor(flat[2 * k] * scale);
  return c < columns[0] ? columns[0] - 1 : c > columns[1] ? columns[1] + 1 : c;
}

/** Returns the head of a line decimated as decimatePolyline would, all but its last run (which may join the tail's first). */
export function decimatePrefix(head: ArrayLike<number>, scale: number, columns: Columns = [-Infinity, Infinity]): DecimatedPrefix {
  const n = head.length >> 1;
  if (n === 0 || !usable(scale)) return { head, kept: [], rest: Array.from(head) };
  // The last run is the longest run of vertices at the end in the last vertex's column.
  const column = columnAt(head, n - 1, scale, columns);
  let lastRun = n - 1;
  while (lastRun > 0 && columnAt(head, lastRun - 1, scale, columns) === column) lastRun--;
  const kept: number[] = [];
  appendRuns(head, lastRun, 0, scale, columns, kept);
  return { head, kept, rest: Array.prototype.slice.call(head, 2 * lastRun) as number[] };
}

/**
 * Returns decimatePolyline(head ++ tail) from the head's prefix and the tail alone (the same points), the head's
 * prefix made with the same scale and columns.
 */
export function decimateAfterPrefix(prefix: DecimatedPrefix, tail: ArrayLike<number>, scale: number, columns: Columns = [-Infinity, Infinity]): number[] {
  const tailN = tail.length >> 1;
  if (!usable(scale) || (prefix.head.length >> 1) + tailN <= 4) return Array.from(prefix.head).concat(Array.from(tail));
  const restN = prefix.rest.length >> 1;
  const rest = new Array<number>(prefix.rest.length + tail.length);
  for (let k = 0; k < prefix.rest.length; k++) rest[k] = prefix.rest[k];
  for (let k = 0; k < tail.length; k++) rest[prefix.rest.length + k] = tail[k];
  const out = prefix.kept.slice();
  appendRuns(rest, restN + tailN, 0, scale, columns, out);
  return out;
}

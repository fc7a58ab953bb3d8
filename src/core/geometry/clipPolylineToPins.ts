// Clip a horizon or regional at its exact crossings with the vertical pins x = pL and x = pR
// (METHOD.md: "each line must cross each pin exactly once"). Contacts with each pin are counted
// so a line that misses a pin, touches it, or folds back across it is reported, never guessed.

/** A polyline clipped to the pins, running from x = pL (first vertex, exact) to x = pR (last vertex, exact). */
export interface ClippedPolyline {
  xs: Float64Array;
  zs: Float64Array;
  /** Per clipped segment k (vertex k to k+1): 1 when it lies on a projected segment of the input. */
  projected: Uint8Array;
  /** Per clipped vertex: fractional position in the input line (i + t between input vertices i and i+1). */
  source: Float64Array;
  /** True when the input ran from the right pin to the left pin and was reversed. */
  reversed: boolean;
}

export interface PinClip {
  /** Separate contacts with the left / right pin line (crossings, touches, runs along it). */
  leftContacts: number;
  rightContacts: number;
  /** The clipped line, or null unless both contact counts are exactly 1. */
  clipped: ClippedPolyline | null;
}

/** A contact: a crossing inside segment `seg` at parameter t, or a run of vertices first..last lying on the pin. */
interface Contact {
  seg: number;
  t: number;
  first: number;
  last: number;
}

function findContacts(xs: ArrayLike<number>, p: number): Contact[] {
  // Side of the pin: −1 left, 0 on it, +1 right (inlined: this loop runs over every vertex).
  const contacts: Contact[] = [];
  const n = xs.length;
  let prev = xs[0] < p ? -1 : xs[0] > p ? 1 : 0;
  let runStart = prev === 0 ? 0 : -1;
  for (let i = 1; i < n; i++) {
    const x = xs[i];
    const s = x < p ? -1 : x > p ? 1 : 0;
    if (s === prev) continue;
    if (s === 0) {
      runStart = i;
    } else if (prev === 0) {
      contacts.push({ seg: -1, t: 0, first: runStart, last: i - 1 });
    } else {
      contacts.push({ seg: i - 1, t: (p - xs[i - 1]) / (x - xs[i - 1]), first: -1, last: -1 });
    }
    prev = s;
  }
  if (prev === 0) contacts.push({ seg: -1, t: 0, first: runStart, last: n - 1 });
  return contacts;
}

function position(c: Contact): number {
  return c.seg >= 0 ? c.seg + c.t : c.first;
}

function reverseCopy(a: ArrayLike<number>, n: number): Float64Array {
  const out = new Float64Array(n);
  for (let i = 0; i < n; i++) out[i] = a[n - 1 - i];
  return out;
}

/** Clip xs/zs to [pL, pR] at the exact pin crossings (reversing a right-to-left line); clipped is null unless each pin is met exactly once. */
export function clipPolylineToPins(
  xs: ArrayLike<number>,
  zs: ArrayLike<number>,
  pL: number,
  pR: number,
  segmentProjected?: ArrayLike<number>,
): PinClip {
  const n = Math.min(xs.length, zs.length);
  if (n < 2) return { leftContacts: 0, rightContacts: 0, clipped: null };
  let left = findContacts(xs, pL);
  let right = findContacts(xs, pR);
  const result: PinClip = { leftContacts: left.length, rightContacts: right.length, clipped: null };
  if (left.length !== 1 || right.length !== 1) return result;
  let X = xs;
  let Z = zs;
  let P = segmentProjected;
  const reversed = position(left[0]) > position(right[0]);
  if (reversed) {
    // Reverse the vertices and the per-segment flags together, then find the contacts again.
    X = reverseCopy(xs, n);
    Z = reverseCopy(zs, n);
    if (segmentProjected) P = reverseCopy(segmentProjected, n - 1);
    left = findContacts(X, pL);
    right = findContacts(X, pR);
  }
  result.clipped = cutBetween(X, Z, P, left[0], right[0], pL, pR, reversed, n);
  return result;
}

function cutBetween(
  X: ArrayLike<number>,
  Z: ArrayLike<number>,
  P: ArrayLike<number> | undefined,
  a: Contact,
  b: Contact,
  pL: number,
  pR: number,
  reversed: boolean,
  n: number,
): ClippedPolyline {
  // Start: the crossing point inside segment a.seg, or the inner end of a vertex run on the left pin.
  const firstInner = a.seg >= 0 ? a.seg + 1 : a.last + 1;
  // End: the crossing point inside segment b.seg, or the first vertex of the run on the right pin.
  const lastInner = b.seg >= 0 ? b.seg : b.first - 1;
  const m = lastInner - firstInner + 3;
  const xs = new Float64Array(m);
  const zs = new Float64Array(m);
  const source = new Float64Array(m);
  const projected = new Uint8Array(m - 1);
  const startSeg = a.seg >= 0 ? a.seg : a.last;
  xs[0] = pL;
  zs[0] = a.seg >= 0 ? Z[a.seg] + a.t * (Z[a.seg + 1] - Z[a.seg]) : Z[a.last];
  source[0] = a.seg >= 0 ? a.seg + a.t : a.last;
  for (let i = firstInner, k = 1; i <= lastInner; i++, k++) {
    xs[k] = X[i];
    zs[k] = Z[i];
    source[k] = i;
  }
  xs[m - 1] = pR;
  zs[m - 1] = b.seg >= 0 ? Z[b.seg] + b.t * (Z[b.seg + 1] - Z[b.seg]) : Z[b.first];
  source[m - 1] = b.seg >= 0 ? b.seg + b.t : b.first;
  if (P) for (let k = 0; k < m - 1; k++) projected[k] = P[startSeg + k] ? 1 : 0;
  if (reversed) for (let k = 0; k < m; k++) source[k] = n - 1 - source[k];
  return { xs, zs, projected, source, reversed };
}

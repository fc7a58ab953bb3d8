import { orient2d } from 'robust-predicates';
import { xMonotoneChains, type XMonotoneChains } from './xMonotoneChains';

// Does an open polyline cross itself? A sweep line in the manner of Shamos & Hoey (1976, "Geometric
// intersection problems", 17th IEEE Symposium on Foundations of Computer Science): segments enter
// an ordered list (a treap) at their left end and leave it at their right end, and only segments
// that become neighbours in that list are tested, so the first crossing is found in O(n log n) —
// it runs along whichever axis the line reverses on less (sweepAxis). npm run bench times a 1,000,000-vertex
// steep zigzag, and a diamond spiral of as many vertices, where the sweep holds nearly every segment at once
// (its worst case). Every side-of-line
// decision is the exact sign of Shewchuk's adaptive orientation predicate (robust-predicates), so
// near-touching fold-backs are judged exactly on the coordinates given.
//
// What counts as a crossing (deliberate, and tested): the line passes from one side of another
// stretch of itself to the other side —
//   - two segments whose interiors cross at one point;
//   - a vertex lying inside another segment, with the line arriving on one side and leaving on the other;
//   - a vertex visited twice where the two visits cross (their directions interleave around it).
// What does not: touching without passing through, the line's own two ends touching anything, and
// collinear overlap — a line that retraces a stretch (down a fault and back up it, or doubling back
// on itself) encloses no area and is not a crossing. A line that comes down onto another stretch, runs
// along it and leaves on the other side does cross (the run along it is followed to where it leaves),
// unless it turns back along the run. Where two visits of one vertex leave along one ray, that vertex
// is taken as a touch. Known gap: in dense tangles where three or more stretches overlap along one line
// the sweep can order the overlapping stretches so that a crossing elsewhere on them is not met (the
// property tests against the all-pairs search pass on integer grids of 0…6, and fail now and then on 0…2).
// Repeated consecutive vertices (zero-length segments) are skipped.

/** Orientation of c relative to the directed line a→b: > 0 left (counter-clockwise, z up), < 0 right, 0 collinear; exact sign. */
function orient(ax: number, az: number, bx: number, bz: number, cx: number, cz: number): number {
  // robust-predicates takes y down (screen axes); negated for z up.
  return -orient2d(ax, az, bx, bz, cx, cz);
}

interface Line {
  /** Vertices with repeated consecutive ones dropped. */
  x: Float64Array;
  z: Float64Array;
  /** Input segment index of each kept segment (segment k joins kept vertices k and k + 1). */
  source: Int32Array;
  n: number;
  /** Kept vertex indices by point, for points the line visits more than once; built at the first contact that needs it. */
  visits: Map<string, number[]> | null;
}

function compact(xs: ArrayLike<number>, zs: ArrayLike<number>): Line {
  const m = Math.min(xs.length, zs.length);
  const x = new Float64Array(m);
  const z = new Float64Array(m);
  const source = new Int32Array(Math.max(0, m - 1));
  let n = 0;
  for (let i = 0; i < m; i++) {
    if (n > 0 && xs[i] === x[n - 1] && zs[i] === z[n - 1]) continue;
    if (n > 0) source[n - 1] = i - 1;
    // + 0 turns −0 into 0, so that the sort on the numbers' bits sees one zero.
    x[n] = xs[i] + 0;
    z[n] = zs[i] + 0;
    n++;
  }
  return { x, z, source, n, visits: null };
}

/** How many times the direction of travel along one coordinate reverses (a zero step keeps the last direction). */
function reversals(v: Float64Array, n: number): number {
  let count = 0;
  let dir = 0;
  for (let i = 1; i < n; i++) {
    const d = v[i] > v[i - 1] ? 1 : v[i] < v[i - 1] ? -1 : 0;
    if (d === 0) continue;
    if (dir !== 0 && d !== dir) count++;
    dir = d;
  }
  return count;
}

/**
 * Sweeps along the coordinate that reverses less often: x and z swap when z does. Swapping the axes mirrors the
 * plane, which turns every orientation sign over but keeps which stretches cross, touch or retrace (each rule
 * above compares signs with each other, never with a fixed one), so the verdict is the same. A steep limb then
 * splits into few monotone chains instead of one per fold-back: a densely traced steep zigzag that reverses in x
 * at every vertex is, swept along z, one chain and needs no sweep at all.
 */
function sweepAxis(L: Line): Line {
  if (reversals(L.z, L.n) >= reversals(L.x, L.n)) return L;
  return { ...L, x: L.z, z: L.x };
}

/** Segment k's left end (smaller x, then smaller z) is vertex lo(k); its right end hi(k). */
function leftEnd(L: Line, k: number): number {
  const a = k, b = k + 1;
  return L.x[a] < L.x[b] || (L.x[a] === L.x[b] && L.z[a] < L.z[b]) ? a : b;
}

/** True when direction d (from v) lies on the ray v→a (collinear, same way). */
function onRay(L: Line, v: number, a: number, d: number): boolean {
  if (orient(L.x[v], L.z[v], L.x[a], L.z[a], L.x[d], L.z[d]) !== 0) return false;
  return (L.x[a] - L.x[v]) * (L.x[d] - L.x[v]) + (L.z[a] - L.z[v]) * (L.z[d] - L.z[v]) > 0;
}

/** True when direction d lies strictly inside the counter-clockwise turn from ray v→a to ray v→b (d on neither ray). */
function inTurn(L: Line, v: number, a: number, b: number, d: number): boolean {
  const vx = L.x[v], vz = L.z[v];
  const oab = orient(vx, vz, L.x[a], L.z[a], L.x[b], L.z[b]);
  const oad = orient(vx, vz, L.x[a], L.z[a], L.x[d], L.z[d]);
  const odb = orient(vx, vz, L.x[d], L.z[d], L.x[b], L.z[b]);
  if (oab > 0) return oad > 0 && odb > 0;
  if (oab < 0) return !(oad <= 0 && odb <= 0);
  // a and b collinear: the same ray (a full turn) or opposite rays (a half turn, left of v→a).
  const same = (L.x[a] - vx) * (L.x[b] - vx) + (L.z[a] - vz) * (L.z[b] - vz) > 0;
  return same || oad > 0;
}

/** Vertex v is visited twice (v at kept index i and j): true when the visits cross there. */
function visitsCross(L: Line, i: number, j: number): boolean {
  if (i === 0 || j === 0 || i === L.n - 1 || j === L.n - 1) return false;
  const [u1, w1, u2, w2] = [i - 1, i + 1, j - 1, j + 1];
  // Coordinates of vertex i stand for both visits (they are equal).
  for (const d of [u2, w2]) if (onRay(L, i, u1, d) || onRay(L, i, w1, d)) return false;
  return inTurn(L, i, w1, u1, u2) !== inTurn(L, i, w1, u1, w2);
}

/**
 * The side of segment s's line where the line next leaves it, walking from vertex v by `step` (±1) over
 * vertices on that line: > 0 left, < 0 right; 0 when the line ends first, or turns back along the line
 * on the way (a retrace: it then leaves from the stretch it came along, and no side is crossed).
 */
function sideLeaving(L: Line, v: number, step: number, s: number): number {
  const ax = L.x[s], az = L.z[s], bx = L.x[s + 1], bz = L.z[s + 1];
  let way = 0;
  for (let k = v + step; k >= 0 && k < L.n; k += step) {
    const o = orient(ax, az, bx, bz, L.x[k], L.z[k]);
    if (o !== 0) return o;
    const along = Math.sign((L.x[k] - L.x[k - step]) * (bx - ax) + (L.z[k] - L.z[k - step]) * (bz - az));
    if (way !== 0 && along !== way) return 0;
    way = along;
  }
  return 0;
}

/** Vertex v (kept index) lies inside segment s: true when the line arrives on one side of s and leaves on the other (runs along s's line in between are followed). */
function passesThrough(L: Line, v: number, s: number): boolean {
  const before = sideLeaving(L, v, -1, s);
  const after = sideLeaving(L, v, 1, s);
  return (before > 0 && after < 0) || (before < 0 && after > 0);
}

/** Every visit (kept vertex index) of the point at vertex v, v included. */
function visitsOf(L: Line, v: number): number[] {
  if (!L.visits) {
    const all = new Map<string, number[]>();
    for (let i = 0; i < L.n; i++) {
      const key = `${L.x[i]},${L.z[i]}`;
      const list = all.get(key);
      if (list) list.push(i);
      else all.set(key, [i]);
    }
    L.visits = new Map([...all].filter(([, list]) => list.length > 1));
  }
  return L.visits.get(`${L.x[v]},${L.z[v]}`) ?? [v];
}

/** True when two of the visits of the point at vertex v cross there. All pairs are judged: with several visits, a touching one can lie between two that cross. */
function pointCrosses(L: Line, v: number): boolean {
  const list = visitsOf(L, v);
  for (let a = 0; a < list.length; a++) {
    for (let b = a + 1; b < list.length; b++) if (visitsCross(L, list[a], list[b])) return true;
  }
  return false;
}

function within(a: number, b: number, c: number): boolean {
  return (a <= c && c <= b) || (b <= c && c <= a);
}

/** Kept segments a < b, not neighbours: true when they make a crossing by the rules above. */
function segmentsCross(L: Line, a: number, b: number): boolean {
  const { x, z } = L;
  const o1 = orient(x[a], z[a], x[a + 1], z[a + 1], x[b], z[b]);
  const o2 = orient(x[a], z[a], x[a + 1], z[a + 1], x[b + 1], z[b + 1]);
  if ((o1 > 0 && o2 > 0) || (o1 < 0 && o2 < 0)) return false;
  const o3 = orient(x[b], z[b], x[b + 1], z[b + 1], x[a], z[a]);
  const o4 = orient(x[b], z[b], x[b + 1], z[b + 1], x[a + 1], z[a + 1]);
  if ((o3 > 0 && o4 > 0) || (o3 < 0 && o4 < 0)) return false;
  if (o1 !== 0 && o2 !== 0 && o3 !== 0 && o4 !== 0) return true;
  // A touch or a collinear overlap: an end of one segment lies on the other. Judge how the line passes
  // there (an overlap is a crossing only when the line arrives on one side and leaves on the other).
  const contacts: [number, number, number][] = [[b, a, o1], [b + 1, a, o2], [a, b, o3], [a + 1, b, o4]];
  for (const [v, s, o] of contacts) {
    if (o !== 0 || !within(x[s], x[s + 1], x[v]) || !within(z[s], z[s + 1], z[v])) continue;
    const atEnd = x[v] === x[s] && z[v] === z[s] ? s : x[v] === x[s + 1] && z[v] === z[s + 1] ? s + 1 : -1;
    if (pointCrosses(L, v)) return true;
    if (atEnd < 0) for (const w of visitsOf(L, v)) if (passesThrough(L, w, s)) return true;
  }
  return false;
}

/** Stable LSD radix pass: `order` sorted by the 16-bit digit of each event's key word, returned in `out`. */
function radixPass(order: Int32Array, out: Int32Array, word: Uint32Array, shift: number, count: Int32Array): void {
  count.fill(0);
  for (let i = 0; i < order.length; i++) count[((word[order[i]] >>> shift) & 0xffff) + 1]++;
  for (let r = 0; r < 0xffff; r++) count[r + 1] += count[r];
  for (let i = 0; i < order.length; i++) out[count[(word[order[i]] >>> shift) & 0xffff]++] = order[i];
}

/** The bits of each double as two unsigned words whose order is the numbers' order (sign flipped, negatives inverted). */
function sortableWords(values: Float64Array): [Uint32Array, Uint32Array] {
  const bits = new Uint32Array(values.buffer, values.byteOffset, values.length * 2);
  const lo = new Uint32Array(values.length);
  const hi = new Uint32Array(values.length);
  // Little-endian: word 2i is the low half of value i (as on every platform the app runs on; checked below).
  const little = new Uint8Array(new Float64Array([1]).buffer)[7] === 0x3f;
  for (let i = 0; i < values.length; i++) {
    const l = bits[little ? 2 * i : 2 * i + 1];
    const h = bits[little ? 2 * i + 1 : 2 * i];
    const negative = h >>> 31 === 1;
    lo[i] = negative ? ~l >>> 0 : l;
    hi[i] = negative ? ~h >>> 0 : (h | 0x80000000) >>> 0;
  }
  return [lo, hi];
}

/**
 * Events (2k entry, 2k + 1 exit of segment k) in sweep order: by x, then z, entries before exits at one point.
 * A radix sort on the numbers' bits (eight stable 16-bit passes, z first, then x) instead of a comparison
 * sort, which took most of the run time on two million events. Coordinates carry no −0 (compact adds 0).
 */
function eventOrder(px: Float64Array, pz: Float64Array): Int32Array {
  const m = px.length;
  let order = new Int32Array(m);
  let spare = new Int32Array(m);
  // Entries (even ids) first, then exits: the last key of the stable passes.
  for (let i = 0, k = 0; i < m; i += 2) order[k++] = i;
  for (let i = 1, k = (m + 1) >> 1; i < m; i += 2) order[k++] = i;
  const count = new Int32Array(0x10001);
  for (const words of [sortableWords(pz), sortableWords(px)]) {
    for (const word of words) {
      for (const shift of [0, 16]) {
        radixPass(order, spare, word, shift, count);
        [order, spare] = [spare, order];
      }
    }
  }
  return order;
}

/**
 * Which kept segments can take part in a crossing: those whose x-range meets an x covered by two or more
 * x-monotone chains. Within one chain (x strictly increasing or decreasing) segments that are not
 * neighbours have disjoint x-ranges, so two segments that cross lie, at the crossing, over an x where two
 * chains overlap; the rest need not enter the sweep. A horizon that folds back in a few places sends only
 * the segments around those places; a line that is all fold-backs (a steep zigzag) sends all of them.
 */
function segmentsInOverlaps(L: Line): Uint8Array {
  const segs = L.n - 1;
  const { x } = L;
  const take = new Uint8Array(segs);
  // Chains: maximal runs of segments along which x strictly increases or strictly decreases (a vertical segment alone).
  const lo: number[] = [], hi: number[] = [];
  let dir = 2;
  for (let k = 0; k < segs; k++) {
    const d = x[k + 1] > x[k] ? 1 : x[k + 1] < x[k] ? -1 : 0;
    const a = x[k] < x[k + 1] ? x[k] : x[k + 1], b = x[k] < x[k + 1] ? x[k + 1] : x[k];
    if (d === dir && d !== 0) {
      if (a < lo[lo.length - 1]) lo[lo.length - 1] = a;
      if (b > hi[hi.length - 1]) hi[hi.length - 1] = b;
    } else {
      lo.push(a); hi.push(b);
      dir = d;
    }
  }
  if (lo.length < 2) return take;
  // x covered by two or more chains (closed intervals): a count over the sorted ends, starts before ends.
  // Starts and ends sorted apart as plain numbers (a typed array's own sort, no comparator: a steep zigzag has
  // a million chains), then merged, a start before an end at the same x.
  const starts = Float64Array.from(lo).sort(), stops = Float64Array.from(hi).sort();
  const zoneLo: number[] = [], zoneHi: number[] = [];
  let depth = 0;
  for (let i = 0, j = 0; i < starts.length || j < stops.length;) {
    const isStart = i < starts.length && (j >= stops.length || starts[i] <= stops[j]);
    const v = isStart ? starts[i++] : stops[j++];
    const before = depth;
    depth += isStart ? 1 : -1;
    if (before < 2 && depth >= 2) zoneLo.push(v);
    else if (before >= 2 && depth < 2) zoneHi.push(v);
  }
  if (zoneLo.length === 0) return take;
  for (let k = 0; k < segs; k++) {
    const a = x[k] < x[k + 1] ? x[k] : x[k + 1], b = x[k] < x[k + 1] ? x[k + 1] : x[k];
    // The first zone that does not end left of the segment.
    let l = 0, h = zoneLo.length;
    while (l < h) {
      const mid = (l + h) >> 1;
      if (zoneHi[mid] < a) l = mid + 1;
      else h = mid;
    }
    if (l < zoneLo.length && zoneLo[l] <= b) take[k] = 1;
  }
  return take;
}

/**
 * The quick path for lines that fold back in a few places: split the kept line into x-monotone chains and
 * test, for each pair of chains whose x-ranges overlap, the pairs of segments that overlap in x, by a
 * merge-like walk over the common range (every such pair is tested, so this is as complete as the all-pairs
 * search). Returns the first crossing pair (kept indices), null when there is none, or undefined once more
 * than `budget` pairs have been tested — a steep limb traced densely has many overlapping chains, and the
 * sweep is then the faster way.
 */
function chainWalk(L: Line, budget: number): [number, number] | null | undefined {
  const chains = xMonotoneChains(L.x, L.z, L.n);
  if (chains.count < 2) return null;
  const order = Array.from({ length: chains.count }, (_, c) => c).sort((a, b) => chains.minX[a] - chains.minX[b] || a - b);
  let tested = 0;
  for (let i = 0; i < order.length; i++) {
    const a = order[i];
    for (let j = i + 1; j < order.length; j++) {
      const b = order[j];
      if (chains.minX[b] > chains.maxX[a]) break;
      const r = walkPair(L, chains, a, b, budget - tested);
      if (r === undefined) return undefined;
      if (r.hit) return r.hit;
      tested += r.tested;
    }
  }
  return null;
}

/** Segments of chain c in increasing x: from its first (x increasing) or last segment. */
function chainStart(ch: XMonotoneChains, c: number): number {
  return ch.direction[c] >= 0 ? ch.firstSegment[c] : ch.lastSegment[c];
}

function chainNext(ch: XMonotoneChains, c: number, s: number): number {
  const n = ch.direction[c] >= 0 ? s + 1 : s - 1;
  return n < ch.firstSegment[c] || n > ch.lastSegment[c] ? -1 : n;
}

// Plain functions, not closures made per call: walkPair runs once per overlapping pair of chains (a million
// times on a steep zigzag), and a closure made each time costs more than the walk itself.
function segLeft(x: Float64Array, s: number): number {
  return x[s] < x[s + 1] ? x[s] : x[s + 1];
}

function segRight(x: Float64Array, s: number): number {
  return x[s] < x[s + 1] ? x[s + 1] : x[s];
}

function walkPair(L: Line, ch: XMonotoneChains, a: number, b: number, budget: number): { hit: [number, number] | null; tested: number } | undefined {
  const { x } = L;
  const x0 = x[0];
  const lo = Math.max(ch.minX[a], ch.minX[b]) + x0;
  const hi = Math.min(ch.maxX[a], ch.maxX[b]) + x0;
  let tested = 0;
  let j = chainStart(ch, b);
  while (j !== -1 && segRight(x, j) < lo) j = chainNext(ch, b, j);
  for (let s = chainStart(ch, a); s !== -1; s = chainNext(ch, a, s)) {
    if (segRight(x, s) < lo) continue;
    if (segLeft(x, s) > hi) break;
    while (j !== -1 && segRight(x, j) < segLeft(x, s)) j = chainNext(ch, b, j);
    for (let t = j; t !== -1 && segLeft(x, t) <= segRight(x, s); t = chainNext(ch, b, t)) {
      if (++tested > budget) return undefined;
      const p = s < t ? s : t, q = s < t ? t : s;
      if (q !== p + 1 && segmentsCross(L, p, q)) return { hit: [p, q], tested };
    }
  }
  return { hit: null, tested };
}

/** An ordered list of segments (a treap, arrays indexed by kept segment), ordered bottom to top at the sweep. */
class SweepList {
  readonly left: Int32Array;
  readonly right: Int32Array;
  readonly parent: Int32Array;
  readonly prio: Float64Array;
  root = -1;
  private seed = 0x9e3779b9;

  constructor(n: number) {
    this.left = new Int32Array(n).fill(-1);
    this.right = new Int32Array(n).fill(-1);
    this.parent = new Int32Array(n).fill(-1);
    this.prio = new Float64Array(n);
  }

  private random(): number {
    // xorshift32: a fixed sequence, so the same line always gives the same tree.
    let s = this.seed;
    s ^= s << 13; s ^= s >>> 17; s ^= s << 5;
    this.seed = s >>> 0;
    return this.seed;
  }

  /** Inserts k; `below(k, e)` says whether k goes below the listed segment e. */
  insert(k: number, below: (k: number, e: number) => boolean): void {
    this.prio[k] = this.random();
    if (this.root < 0) { this.root = k; return; }
    let e = this.root;
    for (;;) {
      if (below(k, e)) {
        if (this.left[e] < 0) { this.left[e] = k; break; }
        e = this.left[e];
      } else {
        if (this.right[e] < 0) { this.right[e] = k; break; }
        e = this.right[e];
      }
    }
    this.parent[k] = e;
    while (this.parent[k] >= 0 && this.prio[this.parent[k]] < this.prio[k]) this.rotateUp(k);
  }

  remove(k: number): void {
    // Rotate k down to a leaf, then cut it off.
    for (;;) {
      const l = this.left[k], r = this.right[k];
      if (l < 0 && r < 0) break;
      const up = l < 0 ? r : r < 0 ? l : this.prio[l] > this.prio[r] ? l : r;
      this.rotateUp(up);
    }
    const p = this.parent[k];
    if (p < 0) this.root = -1;
    else if (this.left[p] === k) this.left[p] = -1;
    else this.right[p] = -1;
    this.parent[k] = -1;
  }

  /** The segment just below k (−1 if none). */
  below(k: number): number {
    if (this.left[k] >= 0) {
      let e = this.left[k];
      while (this.right[e] >= 0) e = this.right[e];
      return e;
    }
    let c = k, p = this.parent[k];
    while (p >= 0 && this.left[p] === c) { c = p; p = this.parent[p]; }
    return p;
  }

  /** The segment just above k (−1 if none). */
  above(k: number): number {
    if (this.right[k] >= 0) {
      let e = this.right[k];
      while (this.left[e] >= 0) e = this.left[e];
      return e;
    }
    let c = k, p = this.parent[k];
    while (p >= 0 && this.right[p] === c) { c = p; p = this.parent[p]; }
    return p;
  }

  private rotateUp(k: number): void {
    const p = this.parent[k];
    const g = this.parent[p];
    if (this.left[p] === k) {
      const b = this.right[k];
      this.left[p] = b;
      if (b >= 0) this.parent[b] = p;
      this.right[k] = p;
    } else {
      const b = this.left[k];
      this.right[p] = b;
      if (b >= 0) this.parent[b] = p;
      this.left[k] = p;
    }
    this.parent[p] = k;
    this.parent[k] = g;
    if (g < 0) this.root = k;
    else if (this.left[g] === p) this.left[g] = k;
    else this.right[g] = k;
  }
}

/**
 * Returns the first pair [i, j] (i < j, input segment indices: segment i joins vertices i and i + 1) found
 * where the line crosses itself, or null when it does not (touches and retraced stretches are not crossings,
 * see above). Fewer than three vertices: null. With `quick` (the default) a chain walk answers first when the
 * line folds back in few places; `false` runs the sweep alone (the same answer, checked by the tests).
 */
export function sweepSelfCrossing(xs: ArrayLike<number>, zs: ArrayLike<number>, quick = true): [number, number] | null {
  const L = sweepAxis(compact(xs, zs));
  const segs = L.n - 1;
  if (segs < 2) return null;
  const { x, z } = L;
  // Events: 2k = segment k enters at its left end, 2k + 1 = it leaves at its right end; sorted by
  // point (x, then z), entries before exits at one point so that segments meeting there are compared.
  // Few fold-backs: the chain walk settles it in about linear time; past a budget, the sweep takes over.
  // (`quick` false: the sweep alone, as the tests check it.)
  const walked = quick ? chainWalk(L, 4 * segs + 10_000) : undefined;
  if (walked !== undefined) return walked && [L.source[walked[0]], L.source[walked[1]]];
  const take = segmentsInOverlaps(L);
  let m = 0;
  for (let k = 0; k < segs; k++) m += take[k];
  if (m < 2) return null;
  // Events of the segments that take part: event 2i / 2i + 1 is the entry / exit of segment ids[i].
  const ids = new Int32Array(m);
  const px = new Float64Array(2 * m);
  const pz = new Float64Array(2 * m);
  // Each segment's left and right end (kept vertex indices), found once.
  const segL = new Int32Array(segs);
  const segR = new Int32Array(segs);
  for (let k = 0, i = 0; k < segs; k++) {
    if (take[k] === 0) continue;
    const lo = leftEnd(L, k), hi = lo === k ? k + 1 : k;
    segL[k] = lo; segR[k] = hi;
    ids[i] = k;
    px[2 * i] = x[lo]; pz[2 * i] = z[lo];
    px[2 * i + 1] = x[hi]; pz[2 * i + 1] = z[hi];
    i++;
  }
  const order = eventOrder(px, pz);
  const list = new SweepList(segs);
  // Where segment k sits relative to the listed segment e at k's left end p.
  const goesBelow = (k: number, e: number): boolean => {
    const kl = segL[k], kr = segR[k], el = segL[e], er = segR[e];
    let o: number;
    if (x[el] === x[er]) {
      // A vertical segment e. Points are swept by x, then z: at a point inside e the sweep has reached e at
      // that height and e goes on above it, so k (leaving to the right) enters below e; at e's top, e ends
      // and k enters above. A vertical k overlapping e lies below it when it ends lower (ties by index).
      const vertical = x[kl] === x[kr];
      if (z[kl] >= z[er]) o = 1;
      else if (!vertical) o = -1;
      else o = z[kr] < z[er] ? -1 : z[kr] > z[er] ? 1 : 0;
    } else {
      o = orient(x[el], z[el], x[er], z[er], x[kl], z[kl]);
      // k starts on e: the direction it leaves in decides (a vertical k leaves upward, above e).
      if (o === 0) o = x[kl] === x[kr] ? 1 : orient(x[el], z[el], x[er], z[er], x[kr], z[kr]);
    }
    return o < 0 || (o === 0 && k < e);
  };
  const test = (a: number, b: number): [number, number] | null => {
    if (a < 0 || b < 0) return null;
    const lo = a < b ? a : b, hi = a < b ? b : a;
    // Neighbours along the line share a vertex and can only overlap (a retrace), never cross.
    if (hi === lo + 1 || !segmentsCross(L, lo, hi)) return null;
    return [L.source[lo], L.source[hi]];
  };
  for (const e of order) {
    const k = ids[e >> 1];
    if ((e & 1) === 0) {
      list.insert(k, goesBelow);
      const hit = test(k, list.below(k)) ?? test(k, list.above(k));
      if (hit) return hit;
    } else {
      const lo = list.below(k), hi = list.above(k);
      list.remove(k);
      const hit = test(lo, hi);
      if (hit) return hit;
    }
  }
  return null;
}

/** Returns every pair [i, j] (input segment indices, sorted) that crosses by the same rules, testing all pairs: O(n²), a reference for tests. */
export function selfCrossingsAllPairs(xs: ArrayLike<number>, zs: ArrayLike<number>): [number, number][] {
  const L = compact(xs, zs);
  const out: [number, number][] = [];
  for (let a = 0; a + 1 < L.n; a++) {
    for (let b = a + 2; b + 1 < L.n; b++) if (segmentsCross(L, a, b)) out.push([L.source[a], L.source[b]]);
  }
  return out;
}

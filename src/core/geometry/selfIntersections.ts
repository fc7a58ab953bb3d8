import { segmentsIntersect } from './segmentsIntersect';

// Where an open polyline crosses or touches itself. Segments are bucketed by their left x
// (a counting sort into n buckets over the x-range, O(n)); each segment is then tested only
// against segments whose left end lies within its own x-range and whose z-range overlaps.
// For a horizon that runs roughly along x each segment meets a handful of candidates, so
// 10,000 vertices take O(n). Repeated consecutive vertices are skipped so they do not count.

/** Pairs [i, j] (i < j) of input segment indices (segment i joins vertices i and i+1) that cross or touch; at most `limit` pairs. */
export function selfIntersections(
  xs: ArrayLike<number>,
  zs: ArrayLike<number>,
  limit = 100,
): [number, number][] {
  const n = Math.min(xs.length, zs.length);
  if (n < 3) return [];
  // Compact the vertices relative to a local origin: drop exact repeats, remember each kept segment's input index.
  const x0 = xs[0];
  const z0 = zs[0];
  const vx = new Float64Array(n);
  const vz = new Float64Array(n);
  const segSource = new Int32Array(n);
  let m = 0;
  for (let i = 0; i < n; i++) {
    const x = xs[i] - x0;
    const z = zs[i] - z0;
    if (m > 0 && x === vx[m - 1] && z === vz[m - 1]) continue;
    vx[m] = x;
    vz[m] = z;
    if (m > 0) segSource[m - 1] = i - 1;
    m++;
  }
  const segs = m - 1;
  if (segs < 2) return [];
  // Segment bounding boxes, once.
  const minX = new Float64Array(segs);
  const maxX = new Float64Array(segs);
  const minZ = new Float64Array(segs);
  const maxZ = new Float64Array(segs);
  for (let s = 0; s < segs; s++) {
    const a = vx[s], b = vx[s + 1], c = vz[s], d = vz[s + 1];
    minX[s] = a < b ? a : b;
    maxX[s] = a < b ? b : a;
    minZ[s] = c < d ? c : d;
    maxZ[s] = c < d ? d : c;
  }
  const { order, start, lo, scale } = bucketByLeftX(minX, maxX, segs);
  const last = segs - 1;
  const found: [number, number][] = [];
  for (let s = 0; s < segs && found.length < limit; s++) {
    const sMinX = minX[s];
    const sMaxX = maxX[s];
    const bFirst = Math.min(last, Math.floor((sMinX - lo) * scale));
    const bLast = Math.min(last, Math.floor((sMaxX - lo) * scale));
    for (let b = bFirst; b <= bLast && found.length < limit; b++) {
      for (let k = start[b]; k < start[b + 1]; k++) {
        const t = order[k];
        const tMinX = minX[t];
        // Each unordered pair once: t's left end lies in s's x-range, ties broken by index.
        if (tMinX < sMinX || (tMinX === sMinX && t <= s) || tMinX > sMaxX) continue;
        if (maxZ[t] < minZ[s] || minZ[t] > maxZ[s]) continue;
        const lo = Math.min(s, t);
        const hi = Math.max(s, t);
        if (pairMeets(vx, vz, lo, hi)) {
          found.push([segSource[lo], segSource[hi]]);
          if (found.length >= limit) break;
        }
      }
    }
  }
  return found.sort((p, q) => p[0] - q[0] || p[1] - q[1]);
}

/** Counting sort of segments into `segs` equal x-buckets by their left end. */
function bucketByLeftX(minX: Float64Array, maxX: Float64Array, segs: number) {
  let lo = Infinity;
  let hi = -Infinity;
  for (let s = 0; s < segs; s++) {
    if (minX[s] < lo) lo = minX[s];
    if (maxX[s] > hi) hi = maxX[s];
  }
  const scale = hi > lo ? segs / (hi - lo) : 0;
  const start = new Int32Array(segs + 1);
  const bucket = new Int32Array(segs);
  for (let s = 0; s < segs; s++) {
    bucket[s] = Math.min(segs - 1, Math.floor((minX[s] - lo) * scale));
    start[bucket[s] + 1]++;
  }
  for (let b = 0; b < segs; b++) start[b + 1] += start[b];
  const fill = start.slice(0, segs);
  const order = new Int32Array(segs);
  for (let s = 0; s < segs; s++) order[fill[bucket[s]]++] = s;
  return { order, start, lo, scale };
}

function pairMeets(vx: Float64Array, vz: Float64Array, s: number, t: number): boolean {
  if (t === s + 1) {
    // Neighbours share vertex s+1; they meet elsewhere only if the line doubles back on itself.
    const ax = vx[s] - vx[s + 1];
    const az = vz[s] - vz[s + 1];
    const dx = vx[t + 1] - vx[s + 1];
    const dz = vz[t + 1] - vz[s + 1];
    return ax * dz - az * dx === 0 && ax * dx + az * dz > 0;
  }
  return segmentsIntersect(vx[s], vz[s], vx[s + 1], vz[s + 1], vx[t], vz[t], vx[t + 1], vz[t + 1]);
}

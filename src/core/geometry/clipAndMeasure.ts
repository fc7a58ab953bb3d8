import type { ClippedPolyline, PinClip } from './clipPolylineToPins';
import { pinContacts, type PinContacts } from './pinContacts';
import { chainsFromStarts, type XMonotoneChains } from './xMonotoneChains';

// Clip a horizon or regional at its exact crossings with the vertical pins x = pL and x = pR
// (docs/method.md §Pins, regional and excess area: "each line must cross each pin exactly once") and measure the clipped line: the
// trapezoid integral ∫ (z − zOrigin) dx (exact for a polyline; the excess area and the regional
// elevation are built from it), the length, and its x-monotone chains (the self-crossing test
// needs them; a line that is one chain cannot cross itself). Two passes: pinContacts reads x
// only, to count contacts and find the clip; then one loop cuts the part between the pins and
// measures it as it copies (DEVELOPERS.md §Code style: typed-array loops in the analysis hot path). Each sum is
// formed exactly as trapezoidIntegral and polylineLength form it, so the values agree to the last bit.

/** A pin clip plus the measures of the clipped line (zero measures and no chains when it is null). */
export interface MeasuredClip {
  clip: PinClip;
  /** ∫ (z − zOrigin) dx along the clipped line (units²), as trapezoidIntegral. */
  integral: number;
  /** The z origin used: the option, else the clipped line's first z. */
  zOrigin: number;
  /** Length of the clipped line (units), as polylineLength. */
  length: number;
  /** x-monotone chains of the clipped line, as xMonotoneChains(clipped.xs, clipped.zs). */
  chains: XMonotoneChains;
  /** chains.count === 1: x strictly increases along every segment of positive length, so the line cannot cross itself. */
  xMonotone: boolean;
}

/** Gives a Float64Array of length n (its contents are overwritten). */
export type ClipAllocate = (n: number) => Float64Array;

const fresh: ClipAllocate = (n) => new Float64Array(n);

/** Clip xs/zs to [pL, pR] at the exact crossings (reversing a right-to-left line) and measure it; clip.clipped is null unless each pin is met exactly once. The clipped arrays come from `allocate` (default new ones). */
export function clipAndMeasure(
  xs: ArrayLike<number>,
  zs: ArrayLike<number>,
  pL: number,
  pR: number,
  segmentProjected?: ArrayLike<number>,
  zOrigin?: number,
  allocate: ClipAllocate = fresh,
): MeasuredClip {
  const n = Math.min(xs.length, zs.length);
  if (n < 2) return unclipped(0, 0, zOrigin);
  let c = pinContacts(xs, n, pL, pR);
  if (c.leftCount !== 1 || c.rightCount !== 1) return unclipped(c.leftCount, c.rightCount, zOrigin);
  if (!c.reversed) return c.found ? cutAndMeasure(xs, zs, c, pL, pR, segmentProjected, zOrigin, false, allocate) : unclipped(1, 1, zOrigin);
  // A right-to-left line: reverse the vertices and the per-segment flags together and find the clip again.
  const rx = reverseCopy(xs, n);
  const rz = reverseCopy(zs, n);
  c = pinContacts(rx, n, pL, pR);
  const flags = segmentProjected ? reverseCopy(segmentProjected, n - 1) : undefined;
  return c.found ? cutAndMeasure(rx, rz, c, pL, pR, flags, zOrigin, true, allocate) : unclipped(1, 1, zOrigin);
}

function unclipped(left: number, right: number, zOrigin: number | undefined): MeasuredClip {
  return {
    clip: { leftContacts: left, rightContacts: right, clipped: null }, integral: 0, zOrigin: zOrigin ?? 0, length: 0,
    chains: chainsFromStarts(new Float64Array(0), 0, [], [], 0), xMonotone: false,
  };
}

function reverseCopy(a: ArrayLike<number>, n: number): Float64Array {
  const out = new Float64Array(n);
  for (let i = 0; i < n; i++) out[i] = a[n - 1 - i];
  return out;
}

/** z at fraction t of segment seg; exact at the vertices (t = 0 or 1). */
function zAt(Z: ArrayLike<number>, seg: number, t: number): number {
  return t === 0 ? Z[seg] : t === 1 ? Z[seg + 1] : Z[seg] + t * (Z[seg + 1] - Z[seg]);
}

const UNSET = 2;

/** Running measures of a cut line (reused by every call: the loop writes them, cutAndMeasure reads them at once). */
const run = { integral: 0, length: 0, dir: UNSET };

/**
 * The clip of a left-to-right line: the start point on the left pin, the input vertices strictly
 * between the pins, the end point on the right pin; copied out and measured in one loop.
 */
function cutAndMeasure(
  X: ArrayLike<number>, Z: ArrayLike<number>, c: PinContacts, pL: number, pR: number,
  P: ArrayLike<number> | undefined, zOption: number | undefined, reversed: boolean, allocate: ClipAllocate,
): MeasuredClip {
  const s = c.startSeg;
  const m = c.endSeg - s + 2;
  const xs = allocate(m);
  const zs = allocate(m);
  const source = allocate(m);
  const z0 = zAt(Z, s, c.startT);
  const zO = zOption ?? z0;
  xs[0] = pL;
  zs[0] = z0;
  source[0] = s + c.startT;
  xs[m - 1] = pR;
  zs[m - 1] = zAt(Z, c.endSeg, c.endT);
  source[m - 1] = c.endSeg + c.endT;
  const chainStarts: number[] = [];
  const chainDirs: number[] = [];
  measureCut(X, Z, s, m, xs, zs, source, zO, chainStarts, chainDirs);
  const projected = new Uint8Array(m - 1);
  if (P) for (let k = 0; k < m - 1; k++) projected[k] = P[s + k] ? 1 : 0;
  const n = X.length;
  if (reversed) for (let k = 0; k < m; k++) source[k] = n - 1 - source[k];
  const chains = chainsFromStarts(xs, m, chainStarts, chainDirs, run.dir);
  const clipped: ClippedPolyline = { xs, zs, projected, source, reversed };
  return {
    clip: { leftContacts: 1, rightContacts: 1, clipped },
    integral: run.integral / 2, zOrigin: zO, length: run.length, chains, xMonotone: chains.count === 1,
  };
}

/**
 * The hot loop, on its own so that V8 compiles it alone: copy input vertices s + 1 … s + m − 2 to
 * xs/zs (whose first and last vertices, the pin points, are already written) and measure all
 * m − 1 segments into `run`; chain starts and directions are pushed as found.
 */
function measureCut(
  X: ArrayLike<number>, Z: ArrayLike<number>, s: number, m: number,
  xs: Float64Array, zs: Float64Array, source: Float64Array, zO: number, chainStarts: number[], chainDirs: number[],
): void {
  const pL = xs[0];
  const z0 = zs[0];
  const last = m - 1;
  // Running measures; (px, pz) the previous vertex, (rx, rz) it relative to the first one (pL, z0).
  let integral = 0;
  let length = 0;
  let px = pL;
  let pz = z0;
  let rx = 0;
  let rz = 0;
  let dir = UNSET;
  for (let k = 1; k < m; k++) {
    // Step 1: vertex k is input vertex s + k, or (k = m − 1) the end point already written.
    let x: number;
    let z: number;
    if (k < last) {
      x = X[s + k];
      z = Z[s + k];
      xs[k] = x;
      zs[k] = z;
      source[k] = s + k;
    } else {
      x = xs[k];
      z = zs[k];
    }
    // Step 2: segment k − 1 → k added to the integral and the length (as trapezoidIntegral and polylineLength).
    const dx = x - px;
    const dz = z - pz;
    integral += (pz - zO + (z - zO)) * dx;
    length += Math.sqrt(dx * dx + dz * dz);
    // Step 3: the segment's x-direction relative to the first vertex; a change starts a new chain (as xMonotoneChains).
    const qx = x - pL;
    const qz = z - z0;
    const d = qx > rx ? 1 : qx < rx ? -1 : qz !== rz ? 0 : UNSET;
    if (d !== UNSET && !(d === dir && d !== 0)) {
      if (dir !== UNSET) {
        chainStarts.push(k - 1);
        chainDirs.push(dir);
      }
      dir = d;
    }
    px = x;
    pz = z;
    rx = qx;
    rz = qz;
  }
  run.integral = integral;
  run.length = length;
  run.dir = dir;
}

import type { ClippedPolyline, PinClip } from './clipPolylineToPins';
import { chainsFromStarts, type XMonotoneChains } from './xMonotoneChains';

// Clip a horizon or regional at its exact crossings with the vertical pins x = pL and x = pR
// (METHOD.md: "each line must cross each pin exactly once") and measure the clipped line in the
// same pass: the trapezoid integral ∫ (z − zOrigin) dx (exact for a polyline; the excess area and
// the regional elevation are built from it), the length, and its x-monotone chains (the
// self-crossing test needs them; a line that is one chain cannot cross itself). The analysis thus
// reads every vertex once for all of these (STYLE.md: typed-array loops in the analysis hot path).
// Contacts are counted as separate touches, crossings or runs along a pin, so a line that misses
// a pin, touches it, or folds back across it is reported, never guessed. Each sum is formed
// exactly as trapezoidIntegral and polylineLength form it, so the values agree to the last bit.

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

/** Clip xs/zs to [pL, pR] at the exact crossings (reversing a right-to-left line) and measure it; clip.clipped is null unless each pin is met exactly once. */
export function clipAndMeasure(
  xs: ArrayLike<number>,
  zs: ArrayLike<number>,
  pL: number,
  pR: number,
  segmentProjected?: ArrayLike<number>,
  zOrigin?: number,
): MeasuredClip {
  const n = Math.min(xs.length, zs.length);
  if (n < 2) return unclipped(0, 0, zOrigin);
  const s = sweep(xs, zs, n, pL, pR, zOrigin);
  if (s.leftCount !== 1 || s.rightCount !== 1) return unclipped(s.leftCount, s.rightCount, zOrigin);
  if (!s.reversed) return finish(s, segmentProjected, false, n);
  // A right-to-left line: reverse the vertices and the per-segment flags together and sweep again.
  const rx = reverseCopy(xs, n);
  const rz = reverseCopy(zs, n);
  const again = sweep(rx, rz, n, pL, pR, zOrigin);
  return finish(again, segmentProjected ? reverseCopy(segmentProjected, n - 1) : undefined, true, n);
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

/** What one sweep found: contact counts, the clipped vertices (meaningful when both counts are 1 and not reversed) and their measures. */
interface Sweep {
  leftCount: number;
  rightCount: number;
  /** The first right-pin contact comes before the first left-pin contact. */
  reversed: boolean;
  xs: Float64Array;
  zs: Float64Array;
  source: Float64Array;
  /** Clipped vertices written, and the input segment where the clipped line starts. */
  m: number;
  startSeg: number;
  integral: number;
  zOrigin: number;
  length: number;
  chainStarts: number[];
  chainDirs: number[];
  lastDir: number;
}

const UNSET = 2;

/**
 * One pass over the input: count the contacts with each pin (separate crossings, or runs of
 * vertices on it) and, between the first left contact and the first right contact, copy the line
 * out and measure it. Lines that cannot be clipped (counts ≠ 1, reversed) are still counted in full.
 */
function sweep(X: ArrayLike<number>, Z: ArrayLike<number>, n: number, pL: number, pR: number, zOption: number | undefined): Sweep {
  // Room for every input vertex after the first plus both pin points: a clip never needs more.
  const xs = new Float64Array(n + 1);
  const zs = new Float64Array(n + 1);
  const source = new Float64Array(n + 1);
  const chainStarts: number[] = [];
  const chainDirs: number[] = [];
  // Side of each pin: −1 left of it, 0 on it, +1 right of it. A contact's position (for the
  // direction test) is its crossing parameter, or the first vertex of its run on the pin.
  let prevL = X[0] < pL ? -1 : X[0] > pL ? 1 : 0;
  let prevR = X[0] < pR ? -1 : X[0] > pR ? 1 : 0;
  let posL = prevL === 0 ? 0 : -1;
  let posR = prevR === 0 ? 0 : -1;
  let nL = 0;
  let nR = 0;
  let copying = false;
  let m = 0;
  let startSeg = 0;
  // Running measures; (px, pz) the previous clipped vertex, (rx, rz) it relative to the first one (pL, z0).
  let integral = 0;
  let length = 0;
  let zO = zOption ?? 0;
  let z0 = 0;
  let px = 0;
  let pz = 0;
  let rx = 0;
  let rz = 0;
  let dir = UNSET;
  for (let i = 1; i < n; i++) {
    const x = X[i];
    let ez = 0;
    let ex = x;
    if (copying && x > pL && x < pR) {
      // Step 1: the common case, an inner vertex of the clipped line (strictly between the pins): copied as it is.
      ez = Z[i];
      source[m] = i;
    } else {
      // Step 2: otherwise, the side of each pin vertex i lies on (−1, 0 on the pin, +1).
      const sL = x < pL ? -1 : x > pL ? 1 : 0;
      const sR = x < pR ? -1 : x > pR ? 1 : 0;
      let emit = false;
      if (sL !== prevL) {
        // Step 3: a left contact begins (a run on the pin, or a crossing) and completes when the line is off the pin.
        // (x ≠ X[i − 1] whenever the side changes, so t is finite.)
        const t = (pL - X[i - 1]) / (x - X[i - 1]);
        if (posL < 0) posL = sL === 0 ? i : i - 1 + t;
        if (sL === 0) {
          // On the pin: the contact completes when the line leaves it. Back on the left pin, no valid clip.
          copying = false;
        } else if (nL++ === 0 && posR < 0 && sL === 1) {
          // The clipped line starts at the crossing inside segment i − 1, or at the last vertex of the run on the pin.
          // (A first left contact followed by x < pL, or by the right pin first, cannot give a valid clip.)
          const onPin = prevL === 0;
          const zStart = onPin ? Z[i - 1] : Z[i - 1] + t * (Z[i] - Z[i - 1]);
          source[0] = onPin ? i - 1 : i - 1 + t;
          xs[0] = pL;
          zs[0] = zStart;
          m = 1;
          startSeg = i - 1;
          zO = zOption ?? zStart;
          z0 = zStart;
          px = pL;
          pz = zStart;
          copying = true;
        } else copying = false;
        prevL = sL;
      }
      if (sR !== prevR) {
        // Step 4: the first right contact begins (a run starts on the pin, or a crossing): the clipped line ends there.
        const t = (pR - X[i - 1]) / (x - X[i - 1]);
        if (posR < 0) posR = sR === 0 ? i : i - 1 + t;
        if (sR !== 0) nR++;
        if (copying) {
          ex = pR;
          ez = sR === 0 ? Z[i] : Z[i - 1] + t * (Z[i] - Z[i - 1]);
          source[m] = sR === 0 ? i : i - 1 + t;
          emit = true;
          copying = false;
        }
        prevR = sR;
      } else if (copying) {
        // The clipped line started in this vertex's segment (step 3), and the vertex is inside: copied as in step 1.
        ez = Z[i];
        source[m] = i;
        emit = true;
      }
      if (!emit) continue;
    }
    // Step 5: write the vertex; add segment m−1 → m to the integral and length (as trapezoidIntegral and polylineLength).
    xs[m] = ex;
    zs[m] = ez;
    const dx = ex - px;
    const dz = ez - pz;
    integral += (pz - zO + (ez - zO)) * dx;
    length += Math.sqrt(dx * dx + dz * dz);
    // Step 6: the segment's x-direction relative to the first vertex; a change starts a new chain (as xMonotoneChains).
    const qx = ex - pL;
    const qz = ez - z0;
    const d = qx > rx ? 1 : qx < rx ? -1 : qz !== rz ? 0 : UNSET;
    if (d !== UNSET && !(d === dir && d !== 0)) {
      if (dir !== UNSET) {
        chainStarts.push(m - 1);
        chainDirs.push(dir);
      }
      dir = d;
    }
    px = ex;
    pz = ez;
    rx = qx;
    rz = qz;
    m++;
  }
  // Runs on a pin that last to the end of the line are contacts too.
  if (prevL === 0) nL++;
  if (prevR === 0) nR++;
  return {
    leftCount: nL, rightCount: nR, reversed: posL > posR, xs, zs, source, m, startSeg,
    integral: integral / 2, zOrigin: zO, length, chainStarts, chainDirs, lastDir: dir,
  };
}

/** The clipped line of a forward sweep as views of exactly m vertices, with projected flags and input positions. */
function finish(s: Sweep, P: ArrayLike<number> | undefined, reversed: boolean, n: number): MeasuredClip {
  const m = s.m;
  const xs = s.xs.subarray(0, m);
  const zs = s.zs.subarray(0, m);
  const source = s.source.subarray(0, m);
  const projected = new Uint8Array(m - 1);
  if (P) for (let k = 0; k < m - 1; k++) projected[k] = P[s.startSeg + k] ? 1 : 0;
  if (reversed) for (let k = 0; k < m; k++) source[k] = n - 1 - source[k];
  const chains = chainsFromStarts(xs, m, s.chainStarts, s.chainDirs, s.lastDir);
  const clipped: ClippedPolyline = { xs, zs, projected, source, reversed };
  return {
    clip: { leftContacts: 1, rightContacts: 1, clipped },
    integral: s.integral, zOrigin: s.zOrigin, length: s.length, chains, xMonotone: chains.count === 1,
  };
}

import { coordinateProblem, LIMITS, tooManyMessage } from './limits';
import type { SectionProblem } from './sectionProblem';

// Reads one list of [x, z] points from unknown JSON straight into typed arrays (the form the
// analysis runs on), pushing a problem that names the horizon and the point instead of throwing.
// A line the app hands over as coordinate arrays ({ xs, zs }, Float64Array: section.ts FlatLine) goes
// through the same checks, and is copied without a pair array a vertex.

/** A line's points as typed arrays (section units), in input order. */
export interface PointArrays { xs: Float64Array; zs: Float64Array }

/** Gives a Float64Array of length n for the points (its contents are overwritten). */
export type Allocate = (n: number) => Float64Array;

/** Points as typed arrays from `allocate`, or null with the problem pushed to `out` (not an array, a bad or non-finite point, fewer than 2); `what` is e.g. 'line' or 'regional'. */
export function readPoints(v: unknown, who: string, what: string, horizon: string | undefined, out: SectionProblem[], allocate: Allocate): PointArrays | null {
  if (isCoordinateArrays(v)) return readCoordinateArrays(v, who, what, horizon, out, allocate);
  if (!Array.isArray(v)) {
    out.push({ code: 'bad-shape', horizon, message: `${who}: "${what}" must be an array of [x, z] points; add it.` });
    return null;
  }
  const n = v.length;
  if (n > LIMITS.pointsPerLine) {
    out.push({ code: 'too-large', horizon, message: `${who}: ${what} has ${tooManyMessage('vertices', n, LIMITS.pointsPerLine)}; simplify the line or split it.` });
    return null;
  }
  const range = LIMITS.coordinateMagnitude;
  // The comparison and the result object are made before the loop and used after it (a bad point is
  // named first): code first met after a long loop has no type feedback when the loop is optimised
  // mid-run (on-stack replacement), and V8 would deoptimise it there on every call.
  const tooFew = n < 2;
  const xs = allocate(n);
  const zs = allocate(n);
  const result: PointArrays = { xs, zs };
  // One pass over every point: this loop reads each vertex of the section, so it is kept lean.
  for (let i = 0; i < n; i++) {
    // Step 1: the point must be an [x, z] pair of numbers.
    const p: unknown = v[i];
    if (!Array.isArray(p) || p.length !== 2) return badPoint(who, what, horizon, i, out);
    const x: unknown = p[0];
    const z: unknown = p[1];
    if (typeof x !== 'number' || typeof z !== 'number') return badPoint(who, what, horizon, i, out);
    // Step 2: finite: x − x is 0 for every finite x, NaN for NaN and ±Infinity (as Number.isFinite).
    if (x - x !== 0 || z - z !== 0) {
      out.push({ code: 'not-finite', horizon, message: `${who}: ${what} point ${i} is not a finite number (NaN or Infinity); fix or delete that point.` });
      return null;
    }
    // Step 3: within the range the engine computes in (squares and areas of larger values lose all precision).
    if (x > range || x < -range || z > range || z < -range) {
      out.push({ code: 'out-of-range', horizon, message: `${who}: ${what} point ${i}: ${coordinateProblem(x > range || x < -range ? x : z)}; convert the section to smaller units or move its origin.` });
      return null;
    }
    // Step 4: copy into the typed arrays the analysis runs on.
    xs[i] = x;
    zs[i] = z;
  }
  if (tooFew) {
    out.push({ code: 'too-few-points', horizon, message: `${who}: ${what} has ${n} point${n === 1 ? '' : 's'}; digitise at least 2 points.` });
    return null;
  }
  return result;
}

function isCoordinateArrays(v: unknown): v is PointArrays {
  return typeof v === 'object' && v !== null && (v as PointArrays).xs instanceof Float64Array && (v as PointArrays).zs instanceof Float64Array;
}

/** readPoints for a line given as coordinate arrays: the same limits, checks and messages, then one copy of each array. */
function readCoordinateArrays(v: PointArrays, who: string, what: string, horizon: string | undefined, out: SectionProblem[], allocate: Allocate): PointArrays | null {
  const n = v.xs.length;
  if (v.zs.length !== n) {
    out.push({ code: 'bad-shape', horizon, message: `${who}: ${what} has ${n} x and ${v.zs.length} z coordinates; give one z for each x.` });
    return null;
  }
  if (n > LIMITS.pointsPerLine) {
    out.push({ code: 'too-large', horizon, message: `${who}: ${what} has ${tooManyMessage('vertices', n, LIMITS.pointsPerLine)}; simplify the line or split it.` });
    return null;
  }
  const bad = firstBadCoordinate(v.xs, v.zs);
  if (bad >= 0) {
    const x = v.xs[bad];
    const z = v.zs[bad];
    if (x - x !== 0 || z - z !== 0) {
      out.push({ code: 'not-finite', horizon, message: `${who}: ${what} point ${bad} is not a finite number (NaN or Infinity); fix or delete that point.` });
    } else {
      const range = LIMITS.coordinateMagnitude;
      out.push({ code: 'out-of-range', horizon, message: `${who}: ${what} point ${bad}: ${coordinateProblem(x > range || x < -range ? x : z)}; convert the section to smaller units or move its origin.` });
    }
    return null;
  }
  if (n < 2) {
    out.push({ code: 'too-few-points', horizon, message: `${who}: ${what} has ${n} point${n === 1 ? '' : 's'}; digitise at least 2 points.` });
    return null;
  }
  const xs = allocate(n);
  const zs = allocate(n);
  xs.set(v.xs);
  zs.set(v.zs);
  return { xs, zs };
}

/** The first index whose x or z is not finite or beyond the coordinate range; −1 when every one is fine. */
function firstBadCoordinate(xs: Float64Array, zs: Float64Array): number {
  const range = LIMITS.coordinateMagnitude;
  for (let i = 0; i < xs.length; i++) {
    const x = xs[i];
    const z = zs[i];
    // Finite and within range in one test each: NaN fails every comparison, so !(…) catches it.
    if (!(x <= range && x >= -range && z <= range && z >= -range)) return i;
  }
  return -1;
}

function badPoint(who: string, what: string, horizon: string | undefined, i: number, out: SectionProblem[]): null {
  out.push({ code: 'bad-shape', horizon, message: `${who}: ${what} point ${i} is not an [x, z] pair of numbers; write it as [x, z].` });
  return null;
}

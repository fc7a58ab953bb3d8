import { nearestOnPolyline, type PolylinePosition } from '../geometry/nearestOnPolyline';
import type { FaultArrays } from './readFault';
import type { Allocate, PointArrays } from './readPoints';
import type { XZ } from './section';
import type { SectionProblem } from './sectionProblem';
import { formatNumber } from './numberText';

// A horizon cut by faults is measured along its joined line (docs/method.md §Faults and horizons in pieces;
// Epard & Groshong 1993 for area balance across fault-related folds): each piece in order, and
// between the end of one piece and the start of the next (the two cutoffs, both on one fault)
// the fault's own trace, in whichever direction it runs. A thrust repeat makes the joined line
// double back along the fault; that is a fold of the line, not a crossing. The stretches along
// faults are flagged so bed length can leave them out (they are not bed).

/** One cutoff pair: the fault, the end of one piece and the start of the next, and the separation (units). */
export interface Cutoff {
  fault: string;
  from: XZ;
  to: XZ;
  /** Distance along the fault between the two cutoffs. */
  slip: number;
  /** |Δx| and |Δz| between the two cutoffs. */
  heave: number;
  throw: number;
}

/** The joined line of a horizon's pieces (section units) and what it is made of. */
export interface JoinedPieces {
  xs: Float64Array;
  zs: Float64Array;
  /** Per joined segment: 1 when it runs along a fault (between cutoffs), 0 on a piece. */
  faultSegments: Uint8Array;
  /** Index in the joined line of each piece's first vertex. */
  pieceStarts: number[];
  /** One per join, in order. */
  cutoffs: Cutoff[];
}

/** Cumulative length of a fault at each vertex (units). */
function cumulative(f: FaultArrays): Float64Array {
  const c = new Float64Array(f.xs.length);
  for (let i = 1; i < f.xs.length; i++) c[i] = c[i - 1] + Math.hypot(f.xs[i] - f.xs[i - 1], f.zs[i] - f.zs[i - 1]);
  return c;
}

interface Join { fault: FaultArrays; a: PolylinePosition; b: PolylinePosition }

/** The fault both points lie on (within `tolerance`): the named one, else the first in the list on which both lie. */
function findJoin(faults: readonly FaultArrays[], ax: number, az: number, bx: number, bz: number, tolerance: number, named: string | undefined): Join | null {
  for (const fault of faults) {
    if (named !== undefined && fault.name !== named) continue;
    const a = nearestOnPolyline(fault.xs, fault.zs, ax, az);
    const b = nearestOnPolyline(fault.xs, fault.zs, bx, bz);
    if (a && b && a.distance <= tolerance && b.distance <= tolerance) return { fault, a, b };
  }
  return null;
}

/**
 * The pieces joined along their faults, or null with the problem pushed to `out` (consecutive pieces not
 * ending on one common fault, or a named fault that does not exist). `tolerance` (units) is how near a
 * piece end must be to a fault to lie on it; `joinFaults`, when given, names the fault of each join.
 */
export function joinPieces(
  pieces: readonly PointArrays[], faults: readonly FaultArrays[], tolerance: number,
  who: string, name: string, out: SectionProblem[], allocate: Allocate, joinFaults?: readonly string[],
): JoinedPieces | null {
  const joins: Join[] = [];
  for (let k = 0; k + 1 < pieces.length; k++) {
    const p = pieces[k], q = pieces[k + 1];
    const end = p.xs.length - 1;
    const [ax, az, bx, bz] = [p.xs[end], p.zs[end], q.xs[0], q.zs[0]];
    const named = joinFaults?.[k];
    if (named !== undefined && !faults.some((f) => f.name === named)) {
      out.push({ code: 'unknown-fault', horizon: name, message: `${who}: the join after piece ${k + 1} names fault "${named}", which the section does not have; add that fault or correct the name.` });
      return null;
    }
    const j = findJoin(faults, ax, az, bx, bz, tolerance, named);
    if (!j) {
      const on = named !== undefined ? `fault "${named}"` : 'one common fault';
      out.push({
        code: 'not-on-fault', horizon: name,
        message: `${who}: the end of piece ${k + 1} (${fmt(ax)}, ${fmt(az)}) and the start of piece ${k + 2} (${fmt(bx)}, ${fmt(bz)}) do not both lie on ${on}; move the piece ends onto the fault that cuts the horizon there.`,
      });
      return null;
    }
    joins.push(j);
  }
  // Size the joined line: every piece vertex, plus the fault vertices strictly between each pair of cutoffs.
  const between: number[][] = joins.map(({ fault, a, b }) => faultVerticesBetween(cumulative(fault), a.along, b.along));
  let n = 0;
  for (const p of pieces) n += p.xs.length;
  for (const v of between) n += v.length;
  const xs = allocate(n);
  const zs = allocate(n);
  const faultSegments = new Uint8Array(Math.max(0, n - 1));
  const pieceStarts: number[] = [];
  const cutoffs: Cutoff[] = [];
  let w = 0;
  pieces.forEach((p, k) => {
    pieceStarts.push(w);
    for (let i = 0; i < p.xs.length; i++, w++) {
      xs[w] = p.xs[i];
      zs[w] = p.zs[i];
    }
    if (k === joins.length) return;
    const { fault, a, b } = joins[k];
    // Segments from this piece's end, through the fault's vertices, to the next piece's start run along the fault.
    for (let s = w - 1; s < w + between[k].length; s++) faultSegments[s] = 1;
    for (const v of between[k]) {
      xs[w] = fault.xs[v];
      zs[w] = fault.zs[v];
      w++;
    }
    const q = pieces[k + 1];
    const from: XZ = [p.xs[p.xs.length - 1], p.zs[p.zs.length - 1]];
    const to: XZ = [q.xs[0], q.zs[0]];
    cutoffs.push({ fault: fault.name, from, to, slip: Math.abs(b.along - a.along), heave: Math.abs(to[0] - from[0]), throw: Math.abs(to[1] - from[1]) });
  });
  return { xs, zs, faultSegments, pieceStarts, cutoffs };
}

/** Indices of the fault vertices strictly between distances `from` and `to` along it, in the order met going from `from` to `to`. */
function faultVerticesBetween(cum: Float64Array, from: number, to: number): number[] {
  const out: number[] = [];
  const lo = Math.min(from, to), hi = Math.max(from, to);
  for (let i = 0; i < cum.length; i++) if (cum[i] > lo && cum[i] < hi) out.push(i);
  if (from > to) out.reverse();
  return out;
}

function fmt(v: number): string {
  return formatNumber(v, 6);
}

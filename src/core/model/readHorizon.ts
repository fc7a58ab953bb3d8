import { joinPieces, type Cutoff } from './joinPieces';
import type { FaultArrays } from './readFault';
import { readPoints, type Allocate, type PointArrays } from './readPoints';
import { readProjectedRuns } from './readProjectedRuns';
import type { SectionProblem } from './sectionProblem';

// Reads one horizon object of a section file: name, line or pieces, regional, include and projected
// runs. A horizon in pieces is joined along its faults here (joinPieces), so the analysis reads one
// line either way. Every problem found is pushed (named after the horizon, or its position when it
// has no name).

/** A validated horizon with its points as typed arrays (section units), the form the analysis reads. */
export interface HorizonArrays {
  name: string;
  include?: boolean;
  /** Projected runs as indices into lineX/lineZ (for a horizon in pieces: into the joined line). */
  projected?: [number, number][];
  /** The line, or for a horizon in pieces the joined line (pieces and the fault stretches between them). */
  lineX: Float64Array;
  lineZ: Float64Array;
  regionalX: Float64Array;
  regionalZ: Float64Array;
  /** Number of pieces (1 for an unbroken line). */
  pieceCount: number;
  /** A horizon in pieces only: the pieces as given, the runs as given (counted along the pieces), the
   *  named faults of the joins as given, which joined segments run along a fault, and the cutoffs. */
  pieces?: PointArrays[];
  pieceProjected?: [number, number][];
  joinFaults?: string[];
  faultSegments?: Uint8Array;
  cutoffs: Cutoff[];
}

/** What joining pieces needs: the section's faults and how near a piece end must be to lie on one (units); null when the pins are unusable. */
export interface JoinContext { faults: readonly FaultArrays[]; tolerance: number }

function isObject(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/** The horizon at position `index` (0-based) as HorizonArrays, or null with every problem pushed to `out`; never throws. */
export function readHorizon(v: unknown, index: number, out: SectionProblem[], allocate: Allocate, join: JoinContext | null = null): HorizonArrays | null {
  if (!isObject(v)) {
    out.push({ code: 'bad-shape', message: `Horizon #${index + 1} is not an object; write it as { "name", "line", "regional" }.` });
    return null;
  }
  const name = typeof v.name === 'string' && v.name.trim() !== '' ? v.name : undefined;
  const who = name !== undefined ? `Horizon "${name}"` : `Horizon #${index + 1}`;
  const before = out.length;
  if (name === undefined) out.push({ code: 'bad-shape', message: `${who} has no name; give it a non-empty "name".` });
  let line: PointArrays | null = null;
  let pieces: PointArrays[] | null = null;
  if (v.line !== undefined && v.pieces !== undefined) {
    out.push({ code: 'bad-shape', horizon: name, message: `${who} has both "line" and "pieces"; give one of them (pieces for a horizon cut by faults).` });
  } else if (v.pieces !== undefined) {
    pieces = readPieces(v.pieces, who, name, out, allocate);
  } else {
    line = readPoints(v.line, who, 'line', name, out, allocate);
  }
  const joinFaults = readJoinFaults(v.joinFaults, pieces ? pieces.length - 1 : null, who, name, out);
  const regional = readPoints(v.regional, who, 'regional', name, out, allocate);
  if (v.include !== undefined && typeof v.include !== 'boolean') {
    out.push({ code: 'bad-shape', horizon: name, message: `${who}: "include" must be true or false.` });
  }
  const vertexCount = line ? line.xs.length : pieces ? pieces.reduce((s, p) => s + p.xs.length, 0) : 0;
  const runs = v.projected !== undefined && (line || pieces) ? readProjectedRuns(v.projected, vertexCount, who, name, out) : undefined;
  if (runs && pieces) runsWithinPieces(runs, pieces, who, name, out);
  if (out.length > before || !(line || pieces) || !regional || name === undefined) return null;
  if (pieces && pieces.length > 1) {
    // Without usable pins there is no tolerance to join by; the pins' own problem is reported.
    if (!join) return null;
    const joined = joinPieces(pieces, join.faults, join.tolerance, who, name, out, allocate, joinFaults ?? undefined);
    if (!joined) return null;
    const h: HorizonArrays = {
      name, lineX: joined.xs, lineZ: joined.zs, regionalX: regional.xs, regionalZ: regional.zs,
      pieceCount: pieces.length, pieces, faultSegments: joined.faultSegments, cutoffs: joined.cutoffs,
    };
    if (joinFaults) h.joinFaults = joinFaults;
    if (typeof v.include === 'boolean') h.include = v.include;
    if (runs) {
      h.pieceProjected = runs;
      h.projected = runs.map(([from, to]) => [toJoined(from, pieces, joined.pieceStarts), toJoined(to, pieces, joined.pieceStarts)]);
    }
    return h;
  }
  const only = line ?? pieces![0];
  const h: HorizonArrays = { name, lineX: only.xs, lineZ: only.zs, regionalX: regional.xs, regionalZ: regional.zs, pieceCount: 1, cutoffs: [] };
  if (pieces) h.pieces = pieces;
  if (typeof v.include === 'boolean') h.include = v.include;
  if (runs) {
    h.projected = runs;
    if (pieces) h.pieceProjected = runs;
  }
  return h;
}

function readPieces(v: unknown, who: string, name: string | undefined, out: SectionProblem[], allocate: Allocate): PointArrays[] | null {
  if (!Array.isArray(v) || v.length === 0) {
    out.push({ code: 'bad-shape', horizon: name, message: `${who}: "pieces" must be a non-empty array of pieces, each an array of [x, z] points.` });
    return null;
  }
  const pieces: PointArrays[] = [];
  let ok = true;
  v.forEach((p, k) => {
    const got = readPoints(p, who, `piece ${k + 1}`, name, out, allocate);
    if (got) pieces.push(got);
    else ok = false;
  });
  return ok ? pieces : null;
}

function readJoinFaults(v: unknown, joins: number | null, who: string, name: string | undefined, out: SectionProblem[]): string[] | null {
  if (v === undefined) return null;
  if (joins === null) {
    out.push({ code: 'bad-shape', horizon: name, message: `${who}: "joinFaults" applies only to a horizon in pieces; remove it or give "pieces".` });
    return null;
  }
  if (!Array.isArray(v) || v.length !== joins || !v.every((f) => typeof f === 'string')) {
    out.push({ code: 'bad-shape', horizon: name, message: `${who}: "joinFaults" must list ${joins} fault name${joins === 1 ? '' : 's'}, one per join between pieces.` });
    return null;
  }
  return v as string[];
}

/** Pushes a problem when a projected run (counted along the pieces) spans the cut between two pieces. */
function runsWithinPieces(runs: [number, number][], pieces: PointArrays[], who: string, name: string | undefined, out: SectionProblem[]): void {
  for (const [from, to] of runs) {
    let start = 0;
    for (let k = 0; k < pieces.length; k++) {
      const end = start + pieces[k].xs.length - 1;
      if (from >= start && from <= end) {
        if (to > end) {
          out.push({ code: 'bad-projected-run', horizon: name, message: `${who}: projected run [${from}, ${to}] runs from piece ${k + 1} into the next; a run must lie within one piece (indices count along the pieces in order).` });
          return;
        }
        break;
      }
      start = end + 1;
    }
  }
}

/** The joined-line index of vertex `i` counted along the pieces in order. */
function toJoined(i: number, pieces: PointArrays[], starts: number[]): number {
  let base = 0;
  for (let k = 0; k < pieces.length; k++) {
    const n = pieces[k].xs.length;
    if (i < base + n) return starts[k] + (i - base);
    base += n;
  }
  return starts[starts.length - 1] + (i - base);
}

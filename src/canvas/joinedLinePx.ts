// A horizon in pieces as drawn, in image pixels: its pieces in order and, between the end of one piece
// and the start of the next, the trace of the fault they are cut by
// (docs/method.md §Faults and horizons in pieces). The join is core's joinPieces, the rule the analysis measures with, run on image pixels
// (an affine calibration maps the fault's trace between two of its points onto the same trace), so the
// outline and the fills follow the line that is measured. A piece end that has left its fault is still
// joined (from the nearest point of the fault), so the line stays drawn while the problem is shown.
import { piecesOfPoints } from '../core/model/piecesOfPoints';
import { joinPieces } from '../core/model/joinPieces';
import type { FaultArrays } from '../core/model/readFault';
import type { PointArrays } from '../core/model/readPoints';
import type { ImagePx } from '../core/model/projectDoc';
import type { SectionProblem } from '../core/model/sectionProblem';

/** A cut of a horizon: the piece starting at vertex `at` is joined to the previous one along fault `faultId`. */
export interface JoinPx { at: number; faultId: string }

/** The joined line (image px), which of its segments run along a fault, and where each piece starts in it. */
export interface JoinedLinePx { points: ImagePx[]; alongFault: boolean[]; pieceStarts: number[] }

const arraysOf = (pts: readonly ImagePx[]): PointArrays => ({ xs: Float64Array.from(pts, (p) => p[0]), zs: Float64Array.from(pts, (p) => p[1]) });

/**
 * Returns the horizon's line as drawn and measured: the vertices themselves when it has no joins, else its pieces
 * joined along their faults. A join whose fault is missing (or has < 2 vertices), or a piece of < 2 vertices,
 * leaves the line unjoined there (a straight step), which the analysis reports.
 */
export function joinedLinePx(pointsPx: readonly ImagePx[], joins: readonly JoinPx[], faults: readonly { id: string; pointsPx: readonly ImagePx[] }[]): JoinedLinePx {
  const plain = (): JoinedLinePx => ({ points: pointsPx.slice(), alongFault: new Array<boolean>(Math.max(0, pointsPx.length - 1)).fill(false), pieceStarts: [0] });
  if (joins.length === 0) return plain();
  const pieces = piecesOfPoints(pointsPx, joins);
  const used = joins.filter((j) => j.at > 0 && j.at < pointsPx.length);
  const faultArrays: FaultArrays[] = [];
  for (const f of faults) if (f.pointsPx.length >= 2) faultArrays.push({ name: f.id, ...arraysOf(f.pointsPx) });
  if (pieces.some((p) => p.length < 2) || used.some((j) => !faultArrays.some((f) => f.name === j.faultId))) return plain();
  const out: SectionProblem[] = [];
  // Any distance counts as on the fault here: the drawing joins from the nearest point; the analysis tells whether it lies on it.
  const joined = joinPieces(pieces.map(arraysOf), faultArrays, Infinity, 'horizon', 'horizon', out, (n) => new Float64Array(n), used.map((j) => j.faultId));
  if (!joined) return plain();
  const points: ImagePx[] = Array.from(joined.xs, (u, i) => [u, joined.zs[i]]);
  return { points, alongFault: Array.from(joined.faultSegments, (s) => s === 1), pieceStarts: joined.pieceStarts };
}

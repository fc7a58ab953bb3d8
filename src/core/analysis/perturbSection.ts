import { nearestOnPolyline } from '../geometry/nearestOnPolyline';
import { linePoints, type AnySection, type Section, type SectionFault, type SectionHorizon, type XZ } from '../model/section';
import { ON_FAULT_TOLERANCE } from '../model/validateSectionArrays';

// The vertex method of the Monte Carlo (docs/method.md §Sensitivity to the regional): the digitising
// error σ is drawn on the elevation of every digitised vertex, the faults' vertices included, since a
// fault is digitised like a horizon. A piece end that lies on a fault (a cutoff) is not digitised on
// its own: it was placed on the fault, so it moves with the fault — kept at the same fraction t along
// the fault segment it lies on, its elevation shifted by (1 − t)·δ₀ + t·δ₁, the shifts of that
// segment's two vertices. Every cutoff therefore stays on its perturbed fault and the pieces still join.

/** Where a piece end lies on a fault: fault index, segment (vertex i to i + 1) and fraction t along it. */
interface OnFault { fault: number; segment: number; t: number }

/** Per horizon, per piece: its first and last vertex's place on a fault, or null where the end is free. */
type EndPlaces = [OnFault | null, OnFault | null][][];

/** A draw of the section with σ on every vertex elevation, cutoffs kept on their faults. */
export type SectionPerturbation = (sigma: number, normal: () => number) => Section;

/** The place on a fault of point (x, z): the join's named fault, else the first fault it lies on within `tolerance`; null when it lies on none. */
function placeOnFault(faults: readonly SectionFault[], x: number, z: number, tolerance: number, named: string | undefined): OnFault | null {
  for (let k = 0; k < faults.length; k++) {
    const f = faults[k];
    if (named !== undefined && f.name !== named) continue;
    const xs = f.line.map((p) => p[0]), zs = f.line.map((p) => p[1]);
    const at = nearestOnPolyline(xs, zs, x, z);
    if (at && at.distance <= tolerance) return { fault: k, segment: at.segment, t: at.t };
  }
  return null;
}

/** The places of every piece end of every horizon (found once: the ends are placed on the unperturbed faults). */
function endPlaces(section: Section, tolerance: number): EndPlaces {
  const faults = section.faults ?? [];
  return section.horizons.map((h) => {
    const pieces = h.pieces ?? (h.line ? [h.line] : []);
    return pieces.map((piece, k): [OnFault | null, OnFault | null] => {
      if (faults.length === 0 || piece.length === 0) return [null, null];
      const first = piece[0], last = piece[piece.length - 1];
      // The join before this piece names its fault at index k − 1, the join after it at index k.
      return [
        placeOnFault(faults, first[0], first[1], tolerance, k > 0 ? h.joinFaults?.[k - 1] : undefined),
        placeOnFault(faults, last[0], last[1], tolerance, k + 1 < pieces.length ? h.joinFaults?.[k] : undefined),
      ];
    });
  });
}

/**
 * A perturbation of `section` (already validated): each call draws σ·normal() on every fault vertex's
 * elevation (in fault order), then on every free horizon vertex's elevation (in horizon and piece order),
 * and returns the perturbed section; σ = 0 returns the same coordinates exactly.
 */
export function sectionPerturbation(given: AnySection): SectionPerturbation {
  // Each draw makes new points anyway: the lines as points once, whichever form they came in.
  const section = asPoints(given);
  const tolerance = ON_FAULT_TOLERANCE * (section.pins[1] - section.pins[0]);
  const places = endPlaces(section, tolerance);
  const faults = section.faults ?? [];
  return (sigma, normal) => {
    const shifts = faults.map((f) => f.line.map(() => sigma * normal()));
    const movedFaults: SectionFault[] = faults.map((f, k) => ({ name: f.name, line: f.line.map(([x, z], i): XZ => [x, z + shifts[k][i]]) }));
    const moveEnd = ([x, z]: XZ, at: OnFault): XZ => {
      const s = shifts[at.fault];
      return [x, z + (1 - at.t) * s[at.segment] + at.t * s[at.segment + 1]];
    };
    const movePiece = (piece: XZ[], ends: [OnFault | null, OnFault | null]): XZ[] => piece.map((p, i) => {
      if (i === 0 && ends[0]) return moveEnd(p, ends[0]);
      if (i === piece.length - 1 && ends[1]) return moveEnd(p, ends[1]);
      return [p[0], p[1] + sigma * normal()];
    });
    const horizons: SectionHorizon[] = section.horizons.map((h, i) => {
      if (h.pieces) return { ...h, pieces: h.pieces.map((piece, k) => movePiece(piece, places[i][k])) };
      if (h.line) return { ...h, line: movePiece(h.line, places[i][0]) };
      return h;
    });
    return { ...section, horizons, ...(section.faults ? { faults: movedFaults } : {}) };
  };
}

/** The section with every horizon and fault line as [x, z] points. */
function asPoints({ horizons: given, faults: givenFaults, ...section }: AnySection): Section {
  const horizons = given.map(({ line, pieces, ...h }): SectionHorizon => ({
    ...h, ...(line ? { line: linePoints(line) } : {}), ...(pieces ? { pieces: pieces.map(linePoints) } : {}),
  }));
  const faults = givenFaults?.map((f): SectionFault => ({ name: f.name, line: linePoints(f.line) }));
  return { ...section, horizons, ...(faults ? { faults } : {}) };
}

// The plain section: what the engine analyses and what the command line reads.
// x is horizontal distance along the section, z is elevation (positive up), both in `units`.

/** A point [x, z] in section units. */
export type XZ = [number, number];

export type LengthUnit = 'm' | 'ft';

/**
 * A line as two coordinate arrays of one length (section units): how the app hands its digitised lines to the
 * engine, so that opening a document of a million vertices makes no pair array a vertex. The engine reads it
 * as it reads [x, z] points; files and the command line use points. Shared: never change its arrays.
 */
export interface FlatLine { xs: Float64Array; zs: Float64Array }

/** A polyline in section units: [x, z] points or coordinate arrays. */
export type SectionLine = XZ[] | FlatLine;

/** A horizon; `L` is the form of its line and pieces (points in files, coordinate arrays from the app). */
export interface SectionHorizon<L extends SectionLine = XZ[]> {
  name: string;
  /** The horizon polyline, in section units, in either direction; exactly one of `line` and `pieces` is given. */
  line?: L;
  /** A horizon cut by faults: its pieces in order along it (each ≥ 2 points); the end of each piece and the
   *  start of the next lie on one common fault (the cutoffs) and are joined along that fault's trace. */
  pieces?: L[];
  /** Optional, one per join: the name of the fault each join follows (else the common fault is found). */
  joinFaults?: string[];
  /** The horizon's pre-folding position (>= 2 points), in section units. */
  regional: XZ[];
  /** Included in the area–depth fit; default true. */
  include?: boolean;
  /** Runs of vertices [fromIndex, toIndex] (inclusive, indices into `line`, or counted along the pieces in order) that are projected (eroded, interpreted). */
  projected?: [number, number][];
}

/** A fault: a named polyline (>= 2 points, not crossing itself), in section units. */
export interface SectionFault<L extends SectionLine = XZ[]> {
  name: string;
  line: L;
}

/**
 * A section; `L` is the form of its horizons' and faults' lines: points (files, the command line, the default),
 * coordinate arrays (the app's docToSection), or either (what the engine reads: `AnySection`).
 */
export interface Section<L extends SectionLine = XZ[]> {
  units: LengthUnit;
  /** Left and right pins, x in section units, left < right. */
  pins: [number, number];
  /** Reference elevation for depths; default the highest regional elevation. */
  referenceElevation?: number;
  /**
   * The smallest length the digitising resolves (units, positive); a bed-length shortening below it gives no
   * Chamberlin depth. The app writes the one it used (digitisingResolution: one scan pixel for lines
   * digitised on a scan); left out, 10⁻⁴ of the pin width (docs/method.md §Digitising resolution).
   */
  resolution?: number;
  horizons: SectionHorizon<L>[];
  /** Faults the horizons' pieces are joined along; default none. */
  faults?: SectionFault<L>[];
}

/** A section with lines in either form: what the engine's entry points read. */
export type AnySection = Section<SectionLine>;

/** A section as the app gives it to the engine (docToSection): every horizon and fault line as coordinate arrays. */
export type FlatSection = Section<FlatLine>;

/** A horizon given as one unbroken line of points (what the folded forward model and most tests build). */
export interface LineHorizon extends SectionHorizon { line: XZ[] }

/** A section whose horizons are all unbroken lines. */
export interface LineSection extends Section { horizons: LineHorizon[] }

/** The pieces of a horizon: its `pieces`, or its unbroken `line` as one piece (none when neither is given). */
export function horizonPieces<L extends SectionLine>(h: SectionHorizon<L>): L[] {
  return h.pieces ?? (h.line ? [h.line] : []);
}

/** True when the line is given as coordinate arrays. */
export function isFlatLine(line: SectionLine): line is FlatLine {
  return !Array.isArray(line);
}

/** Returns the number of vertices of the line. */
export function lineVertexCount(line: SectionLine): number {
  return isFlatLine(line) ? line.xs.length : line.length;
}

/** Returns the line's coordinate arrays: its own for a flat line (shared, not copied), new ones for points. */
export function lineArrays(line: SectionLine): FlatLine {
  if (isFlatLine(line)) return line;
  const xs = new Float64Array(line.length);
  const zs = new Float64Array(line.length);
  for (let i = 0; i < line.length; i++) {
    xs[i] = line[i][0];
    zs[i] = line[i][1];
  }
  return { xs, zs };
}

/** Returns the line as [x, z] points: itself for points, new pairs for a flat line (for files and exports, not hot paths). */
export function linePoints(line: SectionLine): XZ[] {
  if (!isFlatLine(line)) return line;
  const out = new Array<XZ>(line.xs.length);
  for (let i = 0; i < out.length; i++) out[i] = [line.xs[i], line.zs[i]];
  return out;
}

// The plain section: what the engine analyses and what the command line reads.
// x is horizontal distance along the section, z is elevation (positive up), both in `units`.

/** A point [x, z] in section units. */
export type XZ = [number, number];

export type LengthUnit = 'm' | 'ft';

export interface SectionHorizon {
  name: string;
  /** The horizon polyline, in section units, in either direction; exactly one of `line` and `pieces` is given. */
  line?: XZ[];
  /** A horizon cut by faults: its pieces in order along it (each ≥ 2 points); the end of each piece and the
   *  start of the next lie on one common fault (the cutoffs) and are joined along that fault's trace. */
  pieces?: XZ[][];
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
export interface SectionFault {
  name: string;
  line: XZ[];
}

export interface Section {
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
  horizons: SectionHorizon[];
  /** Faults the horizons' pieces are joined along; default none. */
  faults?: SectionFault[];
}

/** A horizon given as one unbroken line (what the folded forward model and most tests build). */
export interface LineHorizon extends SectionHorizon { line: XZ[] }

/** A section whose horizons are all unbroken lines. */
export interface LineSection extends Section { horizons: LineHorizon[] }

/** The pieces of a horizon: its `pieces`, or its unbroken `line` as one piece (none when neither is given). */
export function horizonPieces(h: SectionHorizon): XZ[][] {
  return h.pieces ?? (h.line ? [h.line] : []);
}

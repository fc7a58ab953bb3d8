// The plain section: what the engine analyses and what the command line reads.
// x is horizontal distance along the section, z is elevation (positive up), both in `units`.

/** A point [x, z] in section units. */
export type XZ = [number, number];

export type LengthUnit = 'm' | 'ft';

export interface SectionHorizon {
  name: string;
  /** The horizon polyline, in section units, in either direction. */
  line: XZ[];
  /** The horizon's pre-folding position (>= 2 points), in section units. */
  regional: XZ[];
  /** Included in the area–depth fit; default true. */
  include?: boolean;
  /** Runs of vertices [fromIndex, toIndex] (inclusive, indices into `line`) that are projected (eroded, interpreted). */
  projected?: [number, number][];
}

export interface Section {
  units: LengthUnit;
  /** Left and right pins, x in section units, left < right. */
  pins: [number, number];
  /** Reference elevation for depths; default the highest regional elevation. */
  referenceElevation?: number;
  /**
   * The smallest length the digitising resolves (units): one scan pixel for a section digitised in the app;
   * default DEFAULT_RESOLUTION, the grid section files store coordinates on. A bed-length shortening below it
   * gives no Chamberlin depth.
   */
  resolution?: number;
  horizons: SectionHorizon[];
}

/** Section files store coordinates on a grid of 10⁻⁶ units: no length change below it is digitised. */
export const DEFAULT_RESOLUTION = 1e-6;

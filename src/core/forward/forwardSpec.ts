// The input and output shapes of the forward model (plain data).
import type { LengthUnit, LineSection, XZ } from '../model/section';

/**
 * One fold on a horizon. `from`/`to` bound the fold in x at the anchor elevation (section units);
 * the fold's uplift is `weight` times a unit profile scaled per horizon to hit the target excess area.
 */
export interface FoldSpec {
  shape: 'box' | 'rounded' | 'asymmetric' | 'overturned';
  from: number;
  to: number;
  /** Relative uplift; negative makes a syncline below the regional. Default 1. */
  weight?: number;
  /** asymmetric / overturned: crest position as a fraction of the width (default 0.6). */
  crest?: number;
  /** box: width of each limb as a fraction of the width (default 0.2). */
  limb?: number;
  /** asymmetric: horizontal shift per unit uplift (x per z), i.e. an inclined axial surface. Default 0. */
  shear?: number;
  /** overturned: how far the steep limb folds back on the highest horizon; > 1 overturns (default 1.6). */
  overturn?: number;
}

/** A horizon's regional, relative to its regional elevation (the offsets have zero mean over the pins). */
export type RegionalSpec =
  | { kind: 'horizontal' }
  /** dz/dx of the regional, pivoting about the pins' midpoint. */
  | { kind: 'inclined'; slope: number }
  /** Gently curved: [x, dz] offsets, linear between points and constant beyond them. */
  | { kind: 'curved'; points: XZ[] };

export interface ForwardHorizonSpec {
  name: string;
  /** Mean elevation of the regional over the pins; give this or `depth`. */
  regionalElevation?: number;
  /** Depth of the regional below `referenceElevation` (which is then required). */
  depth?: number;
  /** Overrides the section's folds for this horizon. */
  folds?: FoldSpec[];
  /** Overrides the section's regional shape for this horizon. */
  regional?: RegionalSpec;
  include?: boolean;
}

export interface ForwardSpec {
  units: LengthUnit;
  /** D, in section units: each horizon's excess area is D · (regional elevation − detachment elevation). */
  displacement: number;
  /** Give the detachment as an elevation, or as a depth below the reference elevation. */
  detachmentElevation?: number;
  detachmentDepth?: number;
  referenceElevation?: number;
  pins: [number, number];
  /** x range the horizons and regionals are drawn over; default the pins widened by 5% each side. */
  extent?: [number, number];
  horizons: ForwardHorizonSpec[];
  folds: FoldSpec[];
  regional?: RegionalSpec;
  /** Segments per curved fold profile (default 48). */
  samplesPerFold?: number;
  /** Elevation at which fold positions are given; other horizons shift by shear · Δz. Default the highest regional. */
  anchorElevation?: number;
}

/** What the forward model knows about each horizon it built. */
export interface ForwardHorizonTruth {
  name: string;
  regionalElevation: number;
  depth: number;
  /** Target D · (regional elevation − detachment elevation), units². */
  targetExcessArea: number;
  /** Excess area of the built polylines between the pins, units². */
  excessArea: number;
  bedLength: number;
  regionalLength: number;
  /** L / (W + D) − 1 (Groshong 2006, §11.4.3.2): the layer-parallel strain the built shape implies. */
  lpsStrain: number;
  /** Largest uplift of the horizon above its regional (negative lobes not counted). */
  maxUplift: number;
}

export interface ForwardTruth {
  units: LengthUnit;
  displacement: number;
  detachmentElevation: number;
  detachmentDepth: number;
  referenceElevation: number;
  horizons: ForwardHorizonTruth[];
}

export interface ForwardResult {
  section: LineSection;
  truth: ForwardTruth;
}

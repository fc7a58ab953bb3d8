import { createLeastSquaresWork, leastSquares, type LeastSquaresWork } from '../stats/leastSquares';
import { detachmentOfLine } from './detachmentOfLine';
import type { PreparedSection } from './prepareSection';
import { shiftRegionals, type AdjustedMeasures, type SectionAdjustment } from './shiftRegionals';

// The cheap inner step of sensitivity sweeps and Monte Carlo: adjusted measures, then the
// area–depth least squares over the included horizons (Epard & Groshong 1993), point values only.

/** Point estimates of the area–depth line (units as the section; slope in units, intercept in units²). */
export interface QuickDetachment {
  n: number;
  slope: number;
  intercept: number;
  /** D = −slope. */
  displacement: number;
  /** No zero crossing below the deepest included horizon (or slope 0): no detachment below these horizons (detachmentOfLine). */
  noDetachment: boolean;
  /** zd = −intercept/slope below the reference, and zref·k − zd; null when noDetachment. */
  detachmentDepth: number | null;
  detachmentElevation: number | null;
}

/** Reusable buffers for evaluateShifted, held by the caller (one set per sweep or Monte Carlo run): no module-level state, so computations may interleave. */
export interface EvaluationScratch { measures: AdjustedMeasures; x: Float64Array; y: Float64Array; fit: LeastSquaresWork }

/** Scratch buffers sized for a prepared section. */
export function createEvaluationScratch(prepared: PreparedSection): EvaluationScratch {
  const n = prepared.horizons.length;
  return {
    measures: { areas: new Float64Array(n), regionalElevations: new Float64Array(n), depths: new Float64Array(n), regionalLengths: new Float64Array(n) },
    x: new Float64Array(n), y: new Float64Array(n), fit: createLeastSquaresWork(n),
  };
}

/** Area–depth point estimates after an adjustment; null when fewer than 2 included horizons or all at one depth. */
export function evaluateShifted(prepared: PreparedSection, adj: SectionAdjustment = {}, scratch = createEvaluationScratch(prepared)): QuickDetachment | null {
  const m = shiftRegionals(prepared, adj, scratch.measures);
  let n = 0;
  let deepest = -Infinity;
  for (let i = 0; i < prepared.horizons.length; i++) {
    if (!prepared.included[i]) continue;
    if (m.depths[i] > deepest) deepest = m.depths[i];
    scratch.x[n] = m.depths[i];
    scratch.y[n] = m.areas[i];
    n++;
  }
  const fit = leastSquares(scratch.x.subarray(0, n), scratch.y.subarray(0, n), scratch.fit);
  if (!fit) return null;
  const depth = detachmentOfLine(fit.slope, fit.intercept, deepest).depth;
  const noDetachment = depth === null;
  const zref = prepared.referenceElevation * (adj.scale ?? 1);
  return {
    n, slope: fit.slope, intercept: fit.intercept, displacement: -fit.slope, noDetachment,
    detachmentDepth: depth, detachmentElevation: depth === null ? null : zref - depth,
  };
}

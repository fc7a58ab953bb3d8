import type { SectionAnalysis } from '../../core/analysis/analyseSection';
import { fitAreaDepth, type AreaDepthFit } from '../../core/analysis/fitAreaDepth';

// What the area–depth graph draws for one scenario: a point per horizon and the engine's line
// through the included ones (refitted here only to get the sums the band needs).

export interface GraphPoint {
  id: string;
  name: string;
  /** Depth below the reference (units) and excess area (units²). */
  depth: number;
  area: number;
  included: boolean;
  residual: number | null;
  projectedAreaShare: number;
}

export interface AreaDepthSeries {
  points: GraphPoint[];
  fit: AreaDepthFit;
  referenceElevation: number;
}

/**
 * Graph points (horizon ids from docToSection, same order) and the fit of the included ones; depths below
 * `referenceElevation` when given (to compare scenarios against one reference: the line's slope and its
 * detachment elevation do not depend on it, docs/method.md §Area-depth line), else below the analysis's own.
 */
export function areaDepthSeries(analysis: SectionAnalysis, horizonIds: readonly string[], referenceElevation = analysis.referenceElevation): AreaDepthSeries {
  const zref = referenceElevation;
  const points = analysis.horizons.map((h, i): GraphPoint => ({
    id: horizonIds[i] ?? `#${i}`, name: h.name, depth: zref === analysis.referenceElevation ? h.depth : zref - h.regionalElevation, area: h.excessArea, included: h.included,
    residual: h.residual, projectedAreaShare: h.projectedAreaShare,
  }));
  const inc = points.filter((p) => p.included);
  const fit = fitAreaDepth(inc.map((p) => p.depth), inc.map((p) => p.area), zref);
  return { points, fit, referenceElevation: zref };
}

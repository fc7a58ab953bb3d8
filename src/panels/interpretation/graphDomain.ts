import type { AreaDepthSeries } from './areaDepthSeries';
import { niceDomain } from './niceTicks';

// The part of the area–depth plane to show: the points only ("zoom to data"), or the points plus
// zero area and the detachment with its bounded interval. Long intervals are cut at three data
// spans below the deepest point so that one loose fit does not squash the others.

export interface GraphDomain { area: [number, number]; depth: [number, number] }

/** Area (units²) and depth (units) ranges for the series, widened to 1-2-5 steps; null when there are no points. */
export function graphDomain(series: readonly AreaDepthSeries[], dataOnly: boolean): GraphDomain | null {
  const areas: number[] = [];
  const depths: number[] = [];
  for (const s of series) for (const p of s.points) {
    areas.push(p.area);
    depths.push(p.depth);
  }
  if (areas.length === 0) return null;
  const dMin = Math.min(...depths);
  const dMax = Math.max(...depths);
  const span = Math.max(dMax - dMin, 1);
  if (!dataOnly) {
    areas.push(0);
    for (const s of series) {
      const r = s.fit.result;
      if (!r || r.noDetachment || r.detachmentDepth === null) continue;
      const cap = dMax + 3 * span;
      depths.push(Math.min(r.detachmentDepth, cap));
      const f = r.detachmentDepthInterval;
      if (f.kind === 'bounded') depths.push(Math.min(f.hi, cap), Math.max(f.lo, dMin - span));
    }
  }
  const aMin = Math.min(...areas);
  const aMax = Math.max(...areas);
  const aPad = (aMax - aMin || Math.abs(aMax) || 1) * 0.06;
  const zMin = Math.min(...depths);
  const zMax = Math.max(...depths);
  const zPad = (zMax - zMin || 1) * 0.06;
  const depth = niceDomain(zMin - zPad, zMax + zPad);
  // Depths below the reference are ≥ 0; do not open the axis above the reference for padding alone.
  if (zMin >= 0 && depth[0] < 0) depth[0] = 0;
  return { area: niceDomain(aMin - aPad, aMax + aPad), depth };
}

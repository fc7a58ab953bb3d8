import type { AreaDepthSeries } from './areaDepthSeries';
import { niceDomain } from '../../format/niceTicks';
import { minOf, maxOf } from '../../core/stats/minMax';

// The part of the area–depth plane to show: the points only ("zoom to data"), or the points plus
// zero area and the detachment with its bounded interval. Long intervals are cut at three data
// spans below the deepest point so that one loose fit does not squash the others.

export interface GraphDomain { area: [number, number]; depth: [number, number] }

// A single point (one horizon, or all at one depth or one area) has no span of its own: pad it to
// 10% of its magnitude, and depth to at least a span a section can show (our choice: 200 m or 500 ft),
// rather than to 0.06 m. Areas all zero get 0.1 km² (10⁶ ft²).
const MIN_DEPTH_SPAN: Record<string, number> = { m: 200, ft: 500 };
const ZERO_AREA_SPAN: Record<string, number> = { m: 1e5, ft: 1e6 };

/** [lo, hi] widened about its middle to `minSpan`, or when it is (nearly) one value to 10% of its magnitude if larger (`zeroSpan` when that is 0). */
function atLeast(lo: number, hi: number, minSpan: number, zeroSpan: number): [number, number] {
  const mag = Math.max(Math.abs(lo), Math.abs(hi));
  const single = hi - lo <= 1e-9 * Math.max(1, mag);
  const want = single ? Math.max(minSpan, mag > 0 ? 0.1 * mag : zeroSpan) : minSpan;
  if (hi - lo >= want) return [lo, hi];
  const mid = (lo + hi) / 2;
  return [mid - want / 2, mid + want / 2];
}

/** Area (units²) and depth (units) ranges for the series, widened to 1-2-5 steps and to a minimum span for `units` ("m", "ft"); null when there are no points. */
export function graphDomain(series: readonly AreaDepthSeries[], dataOnly: boolean, units = 'm'): GraphDomain | null {
  const areas: number[] = [];
  const depths: number[] = [];
  for (const s of series) for (const p of s.points) {
    areas.push(p.area);
    depths.push(p.depth);
  }
  if (areas.length === 0) return null;
  const dMin = minOf(depths);
  const dMax = maxOf(depths);
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
  const [aMin, aMax] = atLeast(minOf(areas), maxOf(areas), 0, ZERO_AREA_SPAN[units] ?? ZERO_AREA_SPAN.m);
  const aPad = (aMax - aMin) * 0.06;
  let [zMin, zMax] = atLeast(minOf(depths), maxOf(depths), MIN_DEPTH_SPAN[units] ?? MIN_DEPTH_SPAN.m, MIN_DEPTH_SPAN[units] ?? MIN_DEPTH_SPAN.m);
  // Depths below the reference are ≥ 0; do not open the axis above the reference for padding alone.
  const dataTop = minOf(depths);
  if (dataTop >= 0 && zMin < 0) [zMin, zMax] = [0, zMax - zMin];
  const zPad = (zMax - zMin) * 0.06;
  const depth = niceDomain(zMin - zPad, zMax + zPad);
  if (dataTop >= 0 && depth[0] < 0) depth[0] = 0;
  return { area: niceDomain(aMin - aPad, aMax + aPad), depth };
}

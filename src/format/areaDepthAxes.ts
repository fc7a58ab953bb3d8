// The axes of the area–depth graph, one rule for the pane and the exported figure: which part of the
// area–depth plane to show, the area unit, and the ticks. The points only ("zoom to data"), or the points
// plus zero area and the detachment with its bounded interval; long intervals are cut at three data spans
// below the deepest point so that one loose fit does not squash the others. Ticks at 1-2-5 steps
// (niceTicks): about 5 across and 6 down, whatever the graph's size, so the pane and the figure agree.
import type { AreaDepthResult } from '../core/analysis/fitAreaDepth';
import { minOf, maxOf } from '../core/stats/minMax';
import { areaUnit, largestMagnitude, type AreaUnit } from './formatQuantity';
import { niceDomain, niceTicks } from './niceTicks';

export interface AreaDepthAxes {
  /** Excess area (units²) and depth below the reference (units) shown. */
  area: [number, number];
  depth: [number, number];
  /** The unit the area axis is labelled in; its ticks are in that unit. */
  unit: AreaUnit;
  areaTicks: number[];
  /** Depth ticks (units). */
  depthTicks: number[];
}

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

/**
 * Returns the axes for points (excess area units², depth units) and the fits drawn through them, widened to
 * 1-2-5 steps and to a minimum span for `units` ("m", "ft"); `dataOnly` leaves out zero area and the
 * detachments. Null when there are no points.
 */
export function areaDepthAxes(points: readonly { area: number; depth: number }[], fits: readonly (AreaDepthResult | null)[], dataOnly: boolean, units = 'm'): AreaDepthAxes | null {
  if (points.length === 0) return null;
  const areas = points.map((p) => p.area);
  const depths = points.map((p) => p.depth);
  const unit = areaUnit(units, largestMagnitude(areas));
  const dMin = minOf(depths);
  const dMax = maxOf(depths);
  const span = Math.max(dMax - dMin, 1);
  if (!dataOnly) {
    areas.push(0);
    for (const r of fits) {
      if (!r || r.noDetachment || r.detachmentDepth === null || !Number.isFinite(r.detachmentDepth)) continue;
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
  const area = niceDomain(aMin - aPad, aMax + aPad);
  return {
    area, depth, unit,
    areaTicks: niceTicks(area[0] * unit.factor, area[1] * unit.factor, 5).values,
    depthTicks: niceTicks(depth[0], depth[1], 6).values,
  };
}

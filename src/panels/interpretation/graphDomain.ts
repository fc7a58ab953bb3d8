import type { AreaDepthSeries } from './areaDepthSeries';
import { areaDepthAxes, type AreaDepthAxes } from '../../format/areaDepthAxes';

// The pane's area–depth graph over one or more series (scenarios): every series' points and fits go into
// the one axes rule the exported figure uses too (format/areaDepthAxes.ts).

/** The axes for the series (see areaDepthAxes); null when there are no points. */
export function graphDomain(series: readonly AreaDepthSeries[], dataOnly: boolean, units = 'm'): AreaDepthAxes | null {
  return areaDepthAxes(series.flatMap((s) => s.points), series.map((s) => s.fit.result), dataOnly, units);
}

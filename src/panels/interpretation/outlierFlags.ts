import type { LineFit } from '../../core/stats/leastSquares';
import type { GraphPoint } from './areaDepthSeries';
import { maxOf } from '../../core/stats/minMax';
import { isExactFit } from '../../core/analysis/isExactFit';
import { formatArea, formatFixed, formatNumber, type AreaUnit } from '../../format/formatQuantity';

// Points far off the area–depth line, with the usual geological reasons (Epard & Groshong 1993;
// Groshong 2006 ch. 11, as summarised in docs/method.md §Non-linear graphs). "Far" is an internally
// studentized residual of 2 or more (Draper & Smith 1998, §2.2; common practice), or a residual
// of a tenth of the largest excess area in the fit (our choice, so that 3-point fits, whose
// studentized residuals cannot exceed 1, still get flagged when a point is clearly off).

export interface OutlierFlag { id: string; name: string; residual: number; studentized: number | null; reasons: string[] }

const GROWTH = 'growth strata: beds laid down while the fold grew carry less excess area than the pre-growth line; fit the pre-growth horizons only';
const EROSION = 'erosion: part of the crest may be missing or projected too low; check the projected segment of this horizon';
const UPPER = 'upper detachment: horizons above a second, shallower detachment carry extra area; try the second segment';
const THICKNESS = 'thickness change: a unit that thins or thickens across the fold (e.g. ductile flow into the core) moves its area off the line';

/**
 * Included points flagged as far off the line, each with its likely reasons in plain words; none when the fit has
 * fewer than 3 points, or is exact (its residuals are rounding, whose studentized values mean nothing).
 */
export function outlierFlags(points: readonly GraphPoint[], fit: LineFit | null): OutlierFlag[] {
  if (!fit || fit.n < 3 || isExactFit(fit)) return [];
  const inc = points.filter((p) => p.included);
  const largest = maxOf(inc.map((p) => Math.abs(p.area)));
  const byDepth = [...inc].sort((a, b) => a.depth - b.depth);
  const out: OutlierFlag[] = [];
  inc.forEach((p, k) => {
    const r = fit.residuals[k];
    const leverage = 1 / fit.n + ((p.depth - fit.xMean) ** 2) / fit.sxx;
    const studentized = fit.s > 0 && leverage < 1 ? r / (fit.s * Math.sqrt(1 - leverage)) : null;
    const far = (studentized !== null && Math.abs(studentized) >= 2) || Math.abs(r) >= 0.1 * largest;
    if (!far) return;
    const rank = byDepth.indexOf(p) / Math.max(1, byDepth.length - 1);
    const shallow = rank <= 1 / 3;
    const reasons: string[] = [];
    if (r < 0 && shallow) reasons.push(GROWTH);
    if (r < 0 && (p.projectedAreaShare > 0 || shallow)) reasons.push(EROSION);
    if (r > 0 && shallow) reasons.push(UPPER);
    reasons.push(THICKNESS);
    out.push({ id: p.id, name: p.name, residual: r, studentized, reasons });
  });
  return out;
}

/** Returns how far a flagged point lies off the line, "−1.364 km², −1.4 standard errors", in the table's area unit (the one number rule). */
export function outlierFlagDistance(f: OutlierFlag, unit: AreaUnit | null): string {
  const area = unit ? formatArea(f.residual, '', unit) : formatNumber(f.residual);
  return f.studentized === null ? area : `${area}, ${formatFixed(f.studentized, 1)} standard errors`;
}

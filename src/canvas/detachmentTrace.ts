import type { SectionAnalysis } from '../core/analysis/analyseSection';
import { interpolateZAt } from '../core/geometry/interpolateZAt';
import type { AnySection, XZ } from '../core/model/section';
import { isExactFit } from '../core/analysis/isExactFit';

// Where to draw the proposed detachment on the section: at the estimated elevation at the middle
// of the pins, parallel to the mean regional trend (the mean of each regional's dip between the
// pins), so that its mean elevation over the pins is the area–depth estimate. The 95% band uses the
// Fieller interval on depth (docs/method.md §Fieller interval). Our construction for display; the estimate itself is a level.

export interface DetachmentTrace {
  /** The line and the band's upper and lower edges, section units, left to right. */
  line: [XZ, XZ];
  band: { upper: [XZ, XZ]; lower: [XZ, XZ] } | null;
  depth: number;
  elevation: number;
  /** 95% interval of the elevation (units), or the reason there is none ('exact': the line fits its points exactly, n ≥ 3). */
  elevationInterval: [number, number] | 'unbounded' | 'none' | 'exact';
  /** Where the line crosses the left pin (section units): the label's anchor, over the beds' undeformed part. */
  atLeftPin: XZ;
  /** dz/dx of the mean regional trend. */
  trend: number;
}

/** The detachment trace over the pins widened by `margin` of their width each side; null when there is no detachment estimate. */
export function detachmentTrace(section: AnySection, analysis: SectionAnalysis, margin = 0.04): DetachmentTrace | null {
  const ad = analysis.areaDepth;
  if (!ad || ad.noDetachment || ad.detachmentDepth === null || ad.detachmentElevation === null) return null;
  const [pL, pR] = section.pins;
  const w = pR - pL;
  const dips: number[] = [];
  for (const h of section.horizons) {
    const xs = h.regional.map((p) => p[0]);
    const zs = h.regional.map((p) => p[1]);
    const zl = interpolateZAt(xs, zs, pL);
    const zr = interpolateZAt(xs, zs, pR);
    if (Number.isFinite(zl) && Number.isFinite(zr)) dips.push((zr - zl) / w);
  }
  const trend = dips.length ? dips.reduce((s, d) => s + d, 0) / dips.length : 0;
  const xm = (pL + pR) / 2;
  const x0 = pL - margin * w;
  const x1 = pR + margin * w;
  const at = (z: number): [XZ, XZ] => [[x0, z + trend * (x0 - xm)], [x1, z + trend * (x1 - xm)]];
  const f = ad.detachmentDepthInterval;
  const zref = analysis.referenceElevation;
  return {
    line: at(ad.detachmentElevation),
    band: f.kind === 'bounded' ? { upper: at(zref - f.lo), lower: at(zref - f.hi) } : null,
    depth: ad.detachmentDepth,
    elevation: ad.detachmentElevation,
    elevationInterval: isExactFit(ad) ? 'exact' : f.kind === 'bounded' ? [zref - f.hi, zref - f.lo] : f.kind === 'unbounded' ? 'unbounded' : 'none',
    atLeftPin: [pL, ad.detachmentElevation + trend * (pL - xm)],
    trend,
  };
}

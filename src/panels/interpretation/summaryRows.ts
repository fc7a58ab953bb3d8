import type { SectionAnalysis } from '../../core/analysis/analyseSection';
import { isExactFit } from '../../core/analysis/isExactFit';
import { EXACT_FIT_TEXT, formatInterval, formatLength, formatPercent, formatR2 } from '../../format/formatQuantity';

// The summary of the area–depth fit as label / value / interval rows, shared by the pane and the
// copied table. Shortening = D / (W0 + D): displacement over the original length between the pins
// (W0 now, W0 + D before folding; common practice for bulk shortening). `text` and `interval` are
// written by the one formatting rule (src/format); the copied table writes `value`, `low` and `high`
// as plain numbers instead.

export interface SummaryRow {
  key: string; label: string; value: number | null; text: string;
  /** The 95% interval as shown, or the word for none ("unbounded", "none (n = 2)", the exact-fit wording); '' when not applicable. */
  interval: string;
  /** The 95% interval's ends (section units), null when there is no bounded interval. */
  low: number | null; high: number | null;
  unit: string;
}

/** Summary rows for the analysis (units of the section); values null where the fit gives none; an exact fit gets no zero-width interval. */
export function summaryRows(a: SectionAnalysis): SummaryRow[] {
  const ad = a.areaDepth;
  const u = a.units;
  const ok = ad !== null && !ad.noDetachment;
  const D = ok ? ad.displacement : null;
  const zd = ok ? ad.detachmentDepth : null;
  const elev = ok ? ad.detachmentElevation : null;
  const dci = ok && !isExactFit(ad) ? ad.displacementCI95 : null;
  const fieller = ad?.detachmentDepthInterval;
  const exact = ok && isExactFit(ad);
  const depthRange: [number, number] | null = ok && !exact && fieller?.kind === 'bounded' ? [fieller.lo, fieller.hi] : null;
  const elevRange: [number, number] | null = depthRange ? [a.referenceElevation - depthRange[1], a.referenceElevation - depthRange[0]] : null;
  // An exact fit is said once, beside r²: the three intervals are then left empty rather than zero-wide.
  const words = !ok || !fieller || exact ? '' : fieller.kind === 'unbounded' ? 'unbounded' : fieller.kind === 'bounded' ? null : 'none (n = 2)';
  const shortening = D !== null ? D / (a.pinWidth + D) : null;
  const n = ad ? ad.n : a.horizons.filter((h) => h.included).length;
  const row = (key: string, label: string, value: number | null, text: string, interval: string, range: [number, number] | null, unit: string): SummaryRow =>
    ({ key, label, value, text, interval, low: range ? range[0] : null, high: range ? range[1] : null, unit });
  return [
    row('displacement', 'Displacement D', D, formatLength(D, u), exact ? '' : dci ? formatInterval(dci, u) : ok ? 'none (n = 2)' : '', dci, u),
    row('detachment-depth', 'Detachment depth below reference', zd, formatLength(zd, u), words ?? formatInterval(depthRange, u), depthRange, u),
    row('detachment-elevation', 'Detachment elevation', elev, formatLength(elev, u), words ?? formatInterval(elevRange, u), elevRange, u),
    row('reference', 'Reference elevation', a.referenceElevation, formatLength(a.referenceElevation, u), '', null, u),
    row('r2', 'r²', ad ? ad.r2 : null, formatR2(ad?.r2, exact), exact ? EXACT_FIT_TEXT : '', null, ''),
    row('n', 'Horizons in the fit n', n, String(n), '', null, ''),
    row('pin-width', 'Pin width W0', a.pinWidth, formatLength(a.pinWidth, u), '', null, u),
    row('shortening', 'Shortening D / (W0 + D)', shortening, formatPercent(shortening), '', null, '%'),
  ];
}

const rowsOf = new WeakMap<SectionAnalysis, SummaryRow[]>();

/** summaryRows, made once per analysis (the pane's live texts each read a row). */
export function summaryRowsOf(a: SectionAnalysis): SummaryRow[] {
  const hit = rowsOf.get(a);
  if (hit) return hit;
  const rows = summaryRows(a);
  rowsOf.set(a, rows);
  return rows;
}

import type { SectionAnalysis } from '../../core/analysis/analyseSection';
import { EXACT_FIT_TEXT, isExactFit } from '../../core/analysis/isExactFit';
import { formatLength, formatNumber } from './formatValue';

// The summary of the area–depth fit as label / value / interval rows, shared by the pane and the
// copied table. Shortening = D / (W0 + D): displacement over the original length between the pins
// (W0 now, W0 + D before folding; common practice for bulk shortening).

export interface SummaryRow { key: string; label: string; value: number | null; text: string; interval: string; unit: string }

/** How lengths are written: the number alone (`num`) and with its unit (`len`). */
export interface LengthFormat { num: (v: number) => string; len: (v: number | null, units: string) => string }

// The copied table keeps ASCII minus and whole units so that spreadsheets read it; the pane passes the
// strip's rounding (screenQuantity).
const PLAIN: LengthFormat = { num: (v) => formatNumber(v), len: (v, u) => formatLength(v, u) };

/** Summary rows for the analysis (units of the section); values null where the fit gives none; an exact fit gets no zero-width interval. */
export function summaryRows(a: SectionAnalysis, fmt: LengthFormat = PLAIN): SummaryRow[] {
  const { num, len } = fmt;
  const ad = a.areaDepth;
  const u = a.units;
  const ok = ad !== null && !ad.noDetachment;
  const D = ok ? ad.displacement : null;
  const zd = ok ? ad.detachmentDepth : null;
  const elev = ok ? ad.detachmentElevation : null;
  const dci = ok ? ad.displacementCI95 : null;
  const fieller = ad?.detachmentDepthInterval;
  const exact = ok && isExactFit(ad);
  // An exact fit is said once, beside r²: the three intervals are then left empty rather than zero-wide.
  const depthInterval = !ok || !fieller || exact ? '' : fieller.kind === 'bounded'
    ? `${num(fieller.lo)} to ${num(fieller.hi)} ${u}`
    : fieller.kind === 'unbounded' ? 'unbounded' : 'none (n = 2)';
  const elevInterval = !ok || !fieller || exact ? '' : fieller.kind === 'bounded'
    ? `${num(a.referenceElevation - fieller.hi)} to ${num(a.referenceElevation - fieller.lo)} ${u}`
    : depthInterval;
  const shortening = D !== null ? D / (a.pinWidth + D) : null;
  return [
    { key: 'displacement', label: 'Displacement D', value: D, text: len(D, u), interval: exact ? '' : dci ? `${num(dci[0])} to ${num(dci[1])} ${u}` : ok ? 'none (n = 2)' : '', unit: u },
    { key: 'detachment-depth', label: 'Detachment depth below reference', value: zd, text: len(zd, u), interval: depthInterval, unit: u },
    { key: 'detachment-elevation', label: 'Detachment elevation', value: elev, text: len(elev, u), interval: elevInterval, unit: u },
    { key: 'reference', label: 'Reference elevation', value: a.referenceElevation, text: len(a.referenceElevation, u), interval: '', unit: u },
    { key: 'r2', label: 'r²', value: ad ? ad.r2 : null, text: formatNumber(ad?.r2, 4), interval: exact ? EXACT_FIT_TEXT : '', unit: '' },
    { key: 'n', label: 'Horizons in the fit n', value: ad ? ad.n : a.horizons.filter((h) => h.included).length, text: String(ad ? ad.n : a.horizons.filter((h) => h.included).length), interval: '', unit: '' },
    { key: 'pin-width', label: 'Pin width W0', value: a.pinWidth, text: len(a.pinWidth, u), interval: '', unit: u },
    { key: 'shortening', label: 'Shortening D / (W0 + D)', value: shortening, text: shortening === null ? '—' : `${formatNumber(100 * shortening, 1)} %`, interval: '', unit: '%' },
  ];
}

import type { SectionAnalysis } from '../../core/analysis/analyseSection';
import { formatLength, formatNumber } from './formatValue';

// The summary of the area–depth fit as label / value / interval rows, shared by the pane and the
// copied table. Shortening = D / (W0 + D): displacement over the original length between the pins
// (W0 now, W0 + D before folding; common practice for bulk shortening).

export interface SummaryRow { key: string; label: string; value: number | null; text: string; interval: string; unit: string }

/** Summary rows for the analysis (units of the section); values null where the fit gives none. */
export function summaryRows(a: SectionAnalysis): SummaryRow[] {
  const ad = a.areaDepth;
  const u = a.units;
  const ok = ad !== null && !ad.noDetachment;
  const D = ok ? ad.displacement : null;
  const zd = ok ? ad.detachmentDepth : null;
  const elev = ok ? ad.detachmentElevation : null;
  const dci = ok ? ad.displacementCI95 : null;
  const fieller = ad?.detachmentDepthInterval;
  const depthInterval = !ok || !fieller ? '' : fieller.kind === 'bounded'
    ? `${formatNumber(fieller.lo)} to ${formatNumber(fieller.hi)} ${u}`
    : fieller.kind === 'unbounded' ? 'unbounded' : 'none (n = 2)';
  const elevInterval = !ok || !fieller ? '' : fieller.kind === 'bounded'
    ? `${formatNumber(a.referenceElevation - fieller.hi)} to ${formatNumber(a.referenceElevation - fieller.lo)} ${u}`
    : depthInterval;
  const shortening = D !== null ? D / (a.pinWidth + D) : null;
  return [
    { key: 'displacement', label: 'Displacement D', value: D, text: formatLength(D, u), interval: dci ? `${formatNumber(dci[0])} to ${formatNumber(dci[1])} ${u}` : ok ? 'none (n = 2)' : '', unit: u },
    { key: 'detachment-depth', label: 'Detachment depth below reference', value: zd, text: formatLength(zd, u), interval: depthInterval, unit: u },
    { key: 'detachment-elevation', label: 'Detachment elevation', value: elev, text: formatLength(elev, u), interval: elevInterval, unit: u },
    { key: 'reference', label: 'Reference elevation', value: a.referenceElevation, text: formatLength(a.referenceElevation, u), interval: '', unit: u },
    { key: 'r2', label: 'r²', value: ad ? ad.r2 : null, text: formatNumber(ad?.r2, 4), interval: '', unit: '' },
    { key: 'n', label: 'Horizons in the fit n', value: ad ? ad.n : a.horizons.filter((h) => h.included).length, text: String(ad ? ad.n : a.horizons.filter((h) => h.included).length), interval: '', unit: '' },
    { key: 'pin-width', label: 'Pin width W0', value: a.pinWidth, text: formatLength(a.pinWidth, u), interval: '', unit: u },
    { key: 'shortening', label: 'Shortening D / (W0 + D)', value: shortening, text: shortening === null ? '—' : `${formatNumber(100 * shortening, 1)} %`, interval: '', unit: '%' },
  ];
}

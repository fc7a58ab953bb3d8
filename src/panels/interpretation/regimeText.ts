// The regime in words for the key results (docs/method.md §Area-depth line): the area–depth line's
// displacement D > 0 is shortening, D < 0 extension, E = −D; none without a detachment below the horizons.
import type { AreaDepthResult } from '../../core/analysis/analyseSection';
import { formatLength } from '../../format/formatQuantity';

/** Returns e.g. "shortening (D = 1500 m)" or "extension (E = −D = 1200 m)"; "—" when the fit gives no detachment. */
export function regimeText(ad: AreaDepthResult | null, units: string): string {
  if (!ad || ad.noDetachment || !ad.regime) return '—';
  return ad.regime === 'shortening' ? `shortening (D = ${formatLength(ad.displacement, units)})` : `extension (E = −D = ${formatLength(-ad.displacement, units)})`;
}

// Plain words beside the Chamberlin column: Chamberlin's depth H = A / (L − W₀) assumes bed length is
// conserved (Chamberlin 1910), so the shortening of the bed, L − W₀, equals the displacement D. The
// layer-parallel strain e = L / (W₀ + D) − 1 (Groshong 2006) says how far that fails; then L − W₀ differs
// from D and each Chamberlin depth differs from the horizon's height above the area–depth detachment,
// A / D, by the factor D / (L − W₀). We call the difference large past 25 % (our choice).
import type { SectionAnalysis } from '../core/analysis/analyseSection';
import { formatNumber } from './formatQuantity';

/** Share by which a Chamberlin depth may differ from the area–depth height before the note calls it large. */
export const CHAMBERLIN_LARGE = 0.25;

/** Sign convention of the layer-parallel strain, written beside its column. */
export const STRAIN_SIGN_TEXT = 'negative = shortened along the layer, positive = lengthened';

export interface ChamberlinNote {
  text: string;
  /** True when some Chamberlin depth differs from its area–depth height by more than CHAMBERLIN_LARGE. */
  large: boolean;
}

/** Returns the note on the Chamberlin depths of the included horizons, or null when no horizon has one. */
export function chamberlinNote(a: SectionAnalysis): ChamberlinNote | null {
  const used = a.horizons.filter((h) => h.included && h.chamberlinDepth !== null);
  if (used.length === 0) return null;
  const base = 'Chamberlin’s depth assumes bed length is conserved: that each bed is as long now as before folding, so its shortening L − W₀ equals the displacement.';
  const ad = a.areaDepth;
  if (!ad || ad.noDetachment || ad.detachmentElevation === null) {
    return { text: `${base} Without an area–depth detachment that assumption cannot be checked here.`, large: false };
  }
  const e = ad.detachmentElevation;
  let worst = 1, strain = 0;
  for (const h of used) {
    const height = h.regionalElevation - e;
    if (!(height > 0)) continue;
    const ratio = (h.chamberlinDepth as number) / height;
    if (Math.abs(Math.log(ratio)) > Math.abs(Math.log(worst))) worst = ratio;
  }
  for (const h of a.horizons) if (h.included && h.lpsStrain !== null && Math.abs(h.lpsStrain) > Math.abs(strain)) strain = h.lpsStrain;
  const pct = `${formatNumber(Math.abs(100 * strain), 2)} %`;
  const strainWords = strain < 0 ? `up to ${pct} shorter along the layer than their original length W₀ + D` : `up to ${pct} longer along the layer than their original length W₀ + D`;
  const large = Math.abs(worst - 1) > CHAMBERLIN_LARGE;
  if (!large) {
    return { text: `${base} Here it nearly holds (the beds are ${strainWords}), and Chamberlin’s depths agree with the heights above the area–depth detachment within ${formatNumber(100 * CHAMBERLIN_LARGE, 2)} %.`, large };
  }
  const factor = worst >= 1 ? `up to ${formatNumber(worst, 2)} times` : `down to ${formatNumber(worst, 2)} of`;
  return {
    text: `${base} The layer-parallel strain column shows it was not: the beds are ${strainWords}, so Chamberlin’s depths come out ${factor} the heights above the area–depth detachment. The difference is large: take the detachment from the area–depth line; here Chamberlin’s depths measure the layer-parallel strain, not the detachment.`,
    large,
  };
}

// Where the area–depth line A = a + b·h puts the detachment (Epard & Groshong 1993 for
// shortening; Groshong 1994, Tectonics 13, for extension, whose "lost area" below the regional
// is negative A; docs/method.md §Area-depth line). A = D·(zd − h) holds for either sign of D, so the
// detachment is the zero crossing zd = −a/b whenever that lies below the deepest horizon in the
// fit, whatever the sign of the slope: shortening when D = −b > 0, extension when D < 0. A zero
// slope, or a zero crossing at or above the deepest horizon, is "no detachment below these horizons".

/** Shortening (D > 0, area above the regionals) or extension (D < 0, area lost below them). */
export type Regime = 'shortening' | 'extension';

/** The detachment depth zd below the reference (units) and the regime, or null for both when there is no detachment below `deepest`. */
export function detachmentOfLine(slope: number, intercept: number, deepest: number): { depth: number | null; regime: Regime | null } {
  if (!(slope !== 0) || !Number.isFinite(slope)) return { depth: null, regime: null };
  const zd = -intercept / slope;
  if (!(zd > deepest)) return { depth: null, regime: null };
  return { depth: zd, regime: slope < 0 ? 'shortening' : 'extension' };
}

/** The regime in words for results and reports, e.g. "extension (displacement −1,200 m)" is built by the caller from this. */
export function regimeWords(regime: Regime | null): string {
  return regime === 'shortening' ? 'shortening' : regime === 'extension' ? 'extension' : 'no regime (no detachment below these horizons)';
}

// The smallest length change the digitising of a section resolves: below it a bed-length shortening
// L − W is noise and gives no Chamberlin depth (docs/method.md §Digitising resolution). The one rule,
// used by the app (docToSection), by the engine for any section (prepareSection: a section file, the
// command line) and written into the section files the app saves, so one section gets one verdict:
//   1. A section that states its resolution (a section file's "resolution", kept in the document when
//      the app opens that file) and one digitised on a scan (one scan pixel, the larger of its two sizes
//      in section units) take the coarser of the two known: no line is finer than its source.
//   2. A section that states none and has no scan: RESOLUTION_SHARE_OF_WIDTH of the pin width W₀, about
//      one pixel of a 300 dpi scan of a drawing one metre wide between the pins (a tenth of a millimetre
//      on paper). It scales with the section, so results do not depend on the length unit.
//   3. Six significant figures: the value written into a section file is the value used.

/** Share of the pin width W₀ taken as the resolution of a section that states none and has no scan (10⁻⁴: 1 m over 10 km). */
export const RESOLUTION_SHARE_OF_WIDTH = 1e-4;

export interface ResolutionSource {
  /** The resolution the section states (units); ignored unless a positive finite number. */
  stated?: number;
  /** One scan pixel in section units, when the lines were digitised on a scan; ignored unless positive and finite. */
  scanPixel?: number;
  /** W₀ = pR − pL (units). */
  pinWidth: number;
}

const known = (v: number | undefined): v is number => v !== undefined && Number.isFinite(v) && v > 0;

/**
 * Returns the smallest length the digitising resolves (section units, six significant figures): the coarser
 * of the stated resolution and one scan pixel where either is known, else RESOLUTION_SHARE_OF_WIDTH × |W₀|;
 * 0 (every shortening resolved) when neither is known and W₀ is 0 or not finite.
 */
export function digitisingResolution(source: ResolutionSource): number {
  const { stated, scanPixel, pinWidth } = source;
  const r = known(stated) || known(scanPixel)
    ? Math.max(known(stated) ? stated : 0, known(scanPixel) ? scanPixel : 0)
    : Number.isFinite(pinWidth) ? RESOLUTION_SHARE_OF_WIDTH * Math.abs(pinWidth) : 0;
  return Number(r.toPrecision(6));
}

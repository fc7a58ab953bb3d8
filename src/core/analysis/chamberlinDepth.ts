// Chamberlin (1910, J. Geology 18:228–251): H = A / (L − W), the height of the detachment below
// the horizon's regional, assuming bed length is conserved (docs/method.md §Chamberlin depth). In extension
// both A (lost area) and L − W (bed length lost to the gaps between pieces) are negative and the same
// quotient holds; it is undefined when L = W or when A and L − W have opposite signs.
// L − W is a small difference of two long sums, so the caller forms it without cancellation
// (lengthBeyondSpan of the line less that of the regional). When it is positive but below what the
// digitising resolves (digitisingResolution), H = A / (L − W) is noise — a 1 mm bump over 10 km gives about
// 10¹⁰ m — so no depth is given and the reason says why. The reason is data (its numbers, not text), so the
// one number rule writes it wherever it is shown (src/format/chamberlinReasonText.ts).

/** Why a horizon has no Chamberlin depth; `not-meaningful` carries |L − W| and the resolution (section units). */
export type ChamberlinReason =
  | { kind: 'not-finite' }
  | { kind: 'equal-lengths' }
  | { kind: 'longer-but-lost' }
  | { kind: 'shorter-but-lifted' }
  | { kind: 'not-meaningful'; shortening: number; resolution: number };

/** The Chamberlin depth of a horizon, or why there is none. */
export type ChamberlinResult = { depth: number; reason: null } | { depth: null; reason: ChamberlinReason };

/**
 * Returns H = A / (L − W) (section units) from the excess area A (units²) and the bed-length shortening
 * L − W (units), of either sign (negative both in extension); no depth, with the reason, when L − W is 0 or
 * of the opposite sign to A, when |L − W| is below `resolution` (the smallest length the digitising
 * resolves, units), or when an input is not finite.
 */
export function chamberlinDepth(excessArea: number, shortening: number, resolution = 0): ChamberlinResult {
  if (!Number.isFinite(excessArea) || !Number.isFinite(shortening)) return { depth: null, reason: { kind: 'not-finite' } };
  if (shortening === 0) return { depth: null, reason: { kind: 'equal-lengths' } };
  if (excessArea !== 0 && Math.sign(excessArea) !== Math.sign(shortening)) {
    return { depth: null, reason: { kind: shortening > 0 ? 'longer-but-lost' : 'shorter-but-lifted' } };
  }
  if (Math.abs(shortening) < resolution) return { depth: null, reason: { kind: 'not-meaningful', shortening, resolution } };
  return { depth: excessArea / shortening, reason: null };
}

// Chamberlin (1910, J. Geology 18:228–251): H = A / (L − W), the height of the detachment below
// the horizon's regional, assuming bed length is conserved. Undefined when L ≤ W (docs/method.md §Chamberlin depth).

/** Chamberlin depth H = A/(L − W) in section units; null when L ≤ W or any input is not finite. */
export function chamberlinDepth(excessArea: number, bedLength: number, regionalLength: number): number | null {
  if (!Number.isFinite(excessArea) || !Number.isFinite(bedLength) || !Number.isFinite(regionalLength)) return null;
  const shortening = bedLength - regionalLength;
  return shortening > 0 ? excessArea / shortening : null;
}

// Area–depth–strain (Groshong 2006, §11.4.3.2; Groshong, Withjack, Schlische & Hidayah 2012):
// original length = W + D, so the layer-parallel strain is e = L / (W + D) − 1.

/** Layer-parallel strain e = L/(W + D) − 1 (dimensionless, negative = shortened); null when W + D ≤ 0 or inputs are not finite. */
export function layerParallelStrain(bedLength: number, regionalLength: number, displacement: number): number | null {
  const original = regionalLength + displacement;
  if (!Number.isFinite(bedLength) || !Number.isFinite(original) || original <= 0) return null;
  return bedLength / original - 1;
}

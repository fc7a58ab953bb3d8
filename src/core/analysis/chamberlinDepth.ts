// Chamberlin (1910, J. Geology 18:228–251): H = A / (L − W), the height of the detachment below
// the horizon's regional, assuming bed length is conserved (docs/method.md §Chamberlin depth). In extension
// both A (lost area) and L − W (bed length lost to the gaps between pieces) are negative and the same
// quotient holds; it is undefined when L = W or when A and L − W have opposite signs.
// L − W is a small difference of two long sums, so the caller forms it without cancellation
// (lengthBeyondSpan of the line less that of the regional). When it is positive but below what the
// digitising resolves, H = A / (L − W) is noise — a 1 mm bump over 10 km gives about 10¹⁰ m — so no depth is
// given and the reason says why.

/** The Chamberlin depth of a horizon, or why there is none. */
export type ChamberlinResult = { depth: number; reason: null } | { depth: null; reason: string };

/**
 * Returns H = A / (L − W) (section units) from the excess area A (units²) and the bed-length shortening
 * L − W (units), of either sign (negative both in extension); no depth, with the reason, when L − W is 0 or
 * of the opposite sign to A, when |L − W| is below `resolution` (the smallest length the digitising
 * resolves, units), or when an input is not finite.
 */
export function chamberlinDepth(excessArea: number, shortening: number, resolution = 0, units = ''): ChamberlinResult {
  if (!Number.isFinite(excessArea) || !Number.isFinite(shortening)) return { depth: null, reason: 'its lengths or area are not finite numbers' };
  if (shortening === 0) return { depth: null, reason: 'bed length equals regional length' };
  if (excessArea !== 0 && Math.sign(excessArea) !== Math.sign(shortening)) {
    return { depth: null, reason: shortening > 0
      ? 'the bed is longer than its regional but the area is lost below it'
      : 'the bed is shorter than its regional but the area is lifted above it' };
  }
  if (Math.abs(shortening) < resolution) {
    const u = units ? ` ${units}` : '';
    return { depth: null, reason: `not meaningful: the bed is only ${short(Math.abs(shortening))}${u} ${shortening > 0 ? 'longer' : 'shorter'} than its regional, less than the ${short(resolution)}${u} the digitising resolves` };
  }
  return { depth: excessArea / shortening, reason: null };
}

/**
 * Two significant figures of a positive length, in exponent form outside 10⁻³ … 10⁶ ("2.5", "2e−6"), written as
 * src/format/formatQuantity.ts writes numbers: trailing zeros dropped, the minus sign U+2212.
 */
function short(v: number): string {
  if (v >= 1e-3 && v < 1e6) return String(Number(v.toPrecision(2)));
  const [m, e] = v.toExponential(1).split('e');
  return `${Number(m)}e${Number(e)}`.replace('-', '\u2212');
}

// The rule for a number a person reads, written once. It lives in core so the engine's own messages (a limit
// passed, where a line crosses itself, a piece end off its fault) write their numbers by the same rule as the
// screen, figure, report and terminal; src/format/formatQuantity.ts builds the units, areas and intervals on it.
// - Significant figures: about four by default, never rounding a whole number above its units digit
//   (21519 stays 21519); trailing zeros dropped.
// - No thousands separators, so a value shown can be copied back into a field or a spreadsheet.
// - Magnitudes of 10⁹ and more in exponent form ("3.7e10"): a number that large is a warning, not a length.
// - Negative numbers take the minus sign U+2212; a value that rounds to zero is "0", never "−0".

/** The minus sign U+2212 that every shown negative number takes. */
export const MINUS = '\u2212';

/** Returns decimal text with the minus sign (U+2212) for every hyphen-minus, and "0" for any "-0", "-0.00" … */
export function minusSign(text: string): string {
  if (/^-0(\.0*)?$/.test(text)) return '0';
  return text.replace(/-/g, MINUS);
}

/** Returns v with about `digits` significant figures, as decimal text ("—" when null or not finite, "0" for ±0; exponent form from 10⁹). */
export function formatNumber(v: number | null | undefined, digits = 4): string {
  if (v === null || v === undefined || !Number.isFinite(v)) return '—';
  if (v === 0) return '0';
  if (Math.abs(v) >= 1e9) return exponentForm(v, digits);
  const mag = Math.floor(Math.log10(Math.abs(v)));
  const decimals = Math.max(0, Math.min(6, digits - 1 - mag));
  return minusSign(trimZeros(v.toFixed(decimals)));
}

/** As formatNumber, but a magnitude below 10⁻³ in exponent form instead of rounding to "0" ("2e−6"): for a value that must be seen however small it is. */
export function formatSmallNumber(v: number, digits = 2): string {
  if (Number.isFinite(v) && v !== 0 && Math.abs(v) < 1e-3) return exponentForm(v, digits);
  return formatNumber(v, digits);
}

/** v in exponent form with `digits` significant figures, trailing zeros dropped, the minus sign U+2212 ("3.7e10", "2e−6"). */
function exponentForm(v: number, digits: number): string {
  const [m, e] = v.toExponential(Math.max(0, digits - 1)).split('e');
  return minusSign(`${trimZeros(m)}e${Number(e)}`);
}

function trimZeros(text: string): string {
  return text.includes('.') ? text.replace(/0+$/, '').replace(/\.$/, '') : text;
}

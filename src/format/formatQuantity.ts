// Numbers as a geologist reads them on screen: a few significant figures, no thousands separators
// (so a value can be copied back into a field), areas in km² when metres make them long. Negative numbers
// take the minus sign (U+2212); a value that rounds to zero is "0", never "−0".
import type { LengthUnit } from '../core/model/section';

/** Returns v with about `digits` significant figures, as plain decimal text ("—" when not finite, "0" for ±0). */
export function formatNumber(v: number, digits = 4): string {
  if (!Number.isFinite(v)) return '—';
  if (v === 0) return '0';
  const mag = Math.floor(Math.log10(Math.abs(v)));
  const decimals = Math.max(0, Math.min(6, digits - 1 - mag));
  // Trailing zeros after the decimal point carry no information on screen.
  const text = v.toFixed(decimals).replace(/(\.\d*?)0+$/, '$1').replace(/\.$/, '');
  return minusSign(text);
}

/** Returns decimal text with the minus sign (U+2212) for a hyphen, and "0" for any "-0", "-0.00" … */
export function minusSign(text: string): string {
  if (/^-0(\.0*)?$/.test(text)) return '0';
  return text.replace('-', '\u2212');
}

/** Returns a length with its unit, e.g. "2950 m". */
export function formatLength(v: number, units: LengthUnit): string {
  return `${formatNumber(v)} ${units}`;
}

/** Returns an area with its unit: km² for |A| ≥ 0.01 km² in metres, else units². */
export function formatArea(a: number, units: LengthUnit): string {
  if (units === 'm' && Math.abs(a) >= 1e4) return `${formatNumber(a / 1e6, 3)} km²`;
  return `${formatNumber(a, 3)} ${units}²`;
}

// Numbers for figures and reports: a few significant digits, exponent form for very large values, and
// the minus sign U+2212 (Unicode "MINUS SIGN"; the hyphen-minus U+002D is for data files, which keep it).

const MINUS = '\u2212';

/** Returns number text with every hyphen-minus as the minus sign U+2212, and a zero written negative ("-0", "-0.000") as plain zero. */
export function typographicMinus(text: string): string {
  if (/^-0(\.0*)?$/.test(text)) return text.slice(1);
  return text.replace(/-/g, MINUS);
}

/** Returns the value with `digits` significant figures and the minus sign U+2212 ('—' for null or non-finite, "0" for ±0). */
export function formatNumber(v: number | null | undefined, digits = 4): string {
  if (v === null || v === undefined || !Number.isFinite(v)) return '—';
  if (v === 0) return '0';
  if (Math.abs(v) >= 1e7 || Math.abs(v) < 1e-3) return typographicMinus(v.toExponential(Math.max(0, digits - 2)));
  return typographicMinus(Number(v.toPrecision(digits)).toLocaleString('en-US', { maximumFractionDigits: 6 }));
}

/** Returns 1, 2 or 5 times a power of ten, the nearest at or below the value (for scale bars and ticks). */
export function niceStep(v: number): number {
  if (!(v > 0) || !Number.isFinite(v)) return 1;
  const p = 10 ** Math.floor(Math.log10(v));
  const f = v / p;
  return (f >= 5 ? 5 : f >= 2 ? 2 : 1) * p;
}

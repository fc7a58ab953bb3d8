// Numbers for figures and reports: a few significant digits, exponent form for very large values.

/** Returns the value with `digits` significant figures ('—' for null or non-finite). */
export function formatNumber(v: number | null | undefined, digits = 4): string {
  if (v === null || v === undefined || !Number.isFinite(v)) return '—';
  if (v !== 0 && (Math.abs(v) >= 1e7 || Math.abs(v) < 1e-3)) return v.toExponential(Math.max(0, digits - 2));
  return Number(v.toPrecision(digits)).toLocaleString('en-US', { maximumFractionDigits: 6 });
}

/** Returns 1, 2 or 5 times a power of ten, the nearest at or below the value (for scale bars and ticks). */
export function niceStep(v: number): number {
  if (!(v > 0) || !Number.isFinite(v)) return 1;
  const p = 10 ** Math.floor(Math.log10(v));
  const f = v / p;
  return (f >= 5 ? 5 : f >= 2 ? 2 : 1) * p;
}

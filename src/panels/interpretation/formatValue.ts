// Display rounding for the pane. Numbers use an ASCII minus and no thousands separator so that
// they can be read back (tests, clipboard); the unit always follows the number.

/** The value rounded to `decimals` places as text ("-2500", "0.9981"); "—" for null or non-finite. */
export function formatNumber(v: number | null | undefined, decimals = 0): string {
  if (v === null || v === undefined || !Number.isFinite(v)) return '—';
  const text = v.toFixed(decimals);
  // toFixed keeps the sign of tiny negatives ("-0"): show plain zero.
  return Number(text) === 0 ? (0).toFixed(decimals) : text;
}

/** A length with its unit, rounded to whole units ("-2500 m"); "—" when missing. */
export function formatLength(v: number | null | undefined, units: string, decimals = 0): string {
  const n = formatNumber(v, decimals);
  return n === '—' ? n : `${n} ${units}`;
}

/** A share as a percentage ("12.5 %"). */
export function formatPercent(v: number | null | undefined, decimals = 1): string {
  const n = formatNumber(v === null || v === undefined ? v : 100 * v, decimals);
  return n === '—' ? n : `${n} %`;
}

export interface AreaUnit { factor: number; label: string; decimals: number }

/** Area display unit: km² for metres (10⁶ m²) or 10⁶ ft² for feet, when the areas are that large; else the unit squared. */
export function areaUnit(units: string, largestAbs: number): AreaUnit {
  if (largestAbs >= 1e5) return units === 'm' ? { factor: 1e-6, label: 'km²', decimals: 3 } : { factor: 1e-6, label: `10⁶ ${units}²`, decimals: 3 };
  return { factor: 1, label: `${units}²`, decimals: 0 };
}

/** An area in the display unit with its label ("2.500 km²"). */
export function formatArea(v: number | null | undefined, unit: AreaUnit): string {
  const n = formatNumber(v === null || v === undefined ? v : v * unit.factor, unit.decimals);
  return n === '—' ? n : `${n} ${unit.label}`;
}

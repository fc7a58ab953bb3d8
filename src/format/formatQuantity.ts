// The one rule for numbers a person reads — on screen, in the figure, in the report and in the terminal. The
// number itself is written by core/model/numberText.ts (so the engine's messages follow it too); this module adds
// units, areas, intervals and the exact-fit wording.
// Data files (CSV, GeoJSON, JSON, the clipboard's table) keep plain numbers (plainNumber) instead.
// - Significant figures: about four by default, never rounding a whole number above its units digit
//   (21519 stays 21519, so the same length reads the same wherever it is shown); trailing zeros dropped.
// - No thousands separators anywhere, so a value shown can be copied back into a field or a spreadsheet.
// - Magnitudes of 10⁹ and more in exponent form ("3.7e10"): a number that large is a warning, not a length.
// - Negative numbers take the minus sign U+2212; a value that rounds to zero is "0", never "−0".
// - Areas: one unit per set of values, chosen from the largest magnitude — km² (10⁶ ft² in feet) once it
//   reaches 10⁵ units², else units² (areaUnit).
// - An exact area–depth fit (through its points, n ≥ 3) shows r² with enough digits never to read "1"
//   when there is scatter, and "exact fit: no interval" instead of a zero-width interval.
import { EXACT_FIT_TEXT } from '../core/analysis/isExactFit';
import type { LengthUnit } from '../core/model/section';
import { formatNumber, formatSmallNumber, minusSign, MINUS } from '../core/model/numberText';

export { EXACT_FIT_TEXT, formatNumber, minusSign, MINUS };

/** Returns a length with its unit, e.g. "2950 m" ("—" when missing). */
export function formatLength(v: number | null | undefined, units: string, digits = 4): string {
  const n = formatNumber(v, digits);
  return n === '—' ? n : `${n} ${units}`;
}

/**
 * Returns a length that must be seen however small it is (a shortening far below the digitising resolution)
 * with its unit: as formatLength, but below 10⁻³ units in exponent form instead of rounding to "0" ("2e−6 m").
 */
export function formatSmallLength(v: number, units: string, digits = 2): string {
  const n = formatSmallNumber(v, digits);
  return n === '—' ? n : `${n} ${units}`;
}

/** The display unit of a set of areas: multiply by `factor` and write `label`. */
export interface AreaUnit { factor: number; label: string }

/** Returns the area unit for a set of areas whose largest magnitude is `largestAbs` (units²): km² (10⁶ ft²) from 10⁵ units², else units². */
export function areaUnit(units: LengthUnit | string, largestAbs: number): AreaUnit {
  if (largestAbs >= 1e5) return { factor: 1e-6, label: units === 'm' ? 'km²' : `10⁶ ${units}²` };
  return { factor: 1, label: `${units}²` };
}

/** Returns the largest finite magnitude among the values (0 for none), to choose one area unit for them all. */
export function largestMagnitude(values: Iterable<number | null | undefined>): number {
  let max = 0;
  for (const v of values) if (v !== null && v !== undefined && Number.isFinite(v) && Math.abs(v) > max) max = Math.abs(v);
  return max;
}

/** Returns an area (units²) in the given display unit with its label ("2.5 km²"); the unit defaults to the one for this value alone. */
export function formatArea(v: number | null | undefined, units: LengthUnit | string, unit: AreaUnit = areaUnit(units, Math.abs(v ?? 0)), digits = 4): string {
  const n = formatNumber(v === null || v === undefined ? v : v * unit.factor, digits);
  return n === '—' ? n : `${n} ${unit.label}`;
}

/** Returns the number of an area in the display unit, without the label ("2.5"). */
export function formatAreaNumber(v: number | null | undefined, unit: AreaUnit, digits = 4): string {
  return formatNumber(v === null || v === undefined ? v : v * unit.factor, digits);
}

/** Returns a pixel count in megapixels, without the unit: two significant figures, whole numbers kept ("2.9", "300", "4096"). */
export function formatMegapixels(pixels: number): string {
  return formatNumber(pixels / 1e6, 2);
}

/** Returns a share (0.123) as a percentage with its sign ("12.3 %"; "—" when missing). */
export function formatPercent(share: number | null | undefined, digits = 3): string {
  const n = formatNumber(share === null || share === undefined ? share : 100 * share, digits);
  return n === '—' ? n : `${n} %`;
}

/**
 * Returns r² to four decimals, with as many more as it takes not to read "1" for a fit with scatter
 * (0.99997), "1" only when `exact`; "—" when missing.
 */
export function formatR2(r2: number | null | undefined, exact = false): string {
  if (r2 === null || r2 === undefined || !Number.isFinite(r2)) return '—';
  if (exact) return '1';
  for (let d = 4; d <= 12; d++) {
    const t = r2.toFixed(d);
    if (!/^1\.0*$/.test(t) || r2 >= 1) return minusSign(r2 >= 1 ? '1' : t);
  }
  return `1 ${MINUS} ${formatNumber(1 - r2, 2)}`;
}

/** Returns a 95% interval as "lo to hi unit", or the exact-fit wording when `exact`; "—" when missing. */
export function formatInterval(range: readonly [number, number] | null | undefined, units: string, exact = false): string {
  if (exact) return EXACT_FIT_TEXT;
  if (!range) return '—';
  return `${formatNumber(range[0])} to ${formatLength(range[1], units)}`;
}

/** Returns a number for a data file or the clipboard's table: ASCII, ten significant digits, a float-noise magnitude below 1e-9 as 0; '' when missing. */
export function plainNumber(v: number | null | undefined, digits = 10): string {
  if (v === null || v === undefined || !Number.isFinite(v)) return '';
  return Math.abs(v) < 1e-9 ? '0' : String(Number(v.toPrecision(digits)));
}

/** Returns v to a fixed number of decimals (tick and grid labels, cursor readouts), with the minus sign U+2212 and never "−0" ("−1250.5", "0.0"). */
export function formatFixed(v: number, decimals: number): string {
  const text = v.toFixed(decimals);
  if (/^-0(\.0*)?$/.test(text)) return text.slice(1);
  return minusSign(text);
}

/** Returns a horizon's Chamberlin depth as a number, "not meaningful" when its shortening is below the digitising resolution, else "—". */
export function formatChamberlin(h: { chamberlinDepth: number | null; chamberlinReason: { kind: string } | null }): string {
  if (h.chamberlinDepth !== null) return formatNumber(h.chamberlinDepth);
  return h.chamberlinReason?.kind === 'not-meaningful' ? 'not meaningful' : '—';
}

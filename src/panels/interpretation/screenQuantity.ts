// Detachment depth, elevation and displacement as the results strip shows them (one rounding rule
// for the same quantity in the strip and the pane: src/format/formatQuantity, about four
// significant figures with a typographic minus). This file only adapts it to null values, so that a
// change of that formatter's API is met in one place.
import type { LengthUnit } from '../../core/model/section';
import { formatLength, formatNumber } from '../../format/formatQuantity';

/** The number as the strip rounds it ("−2590", "711.8"); "—" for null or non-finite. */
export function screenNumber(v: number | null | undefined): string {
  return v === null || v === undefined || !Number.isFinite(v) ? '—' : formatNumber(v);
}

/** A length with its unit as the strip shows it ("−2590 m"); "—" for null or non-finite. */
export function screenLength(v: number | null | undefined, units: string): string {
  return v === null || v === undefined || !Number.isFinite(v) ? '—' : formatLength(v, units as LengthUnit);
}

/** The pane's length format for summaryRows. */
export const SCREEN_FORMAT = { num: (v: number) => screenNumber(v), len: screenLength };

/** The text with a typographic minus for a leading hyphen-minus, as the strip writes negative numbers ("-120" → "−120"). */
export function withMinus(text: string): string {
  return text.replace(/^-/, '\u2212');
}

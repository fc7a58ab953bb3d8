// Axis ticks, grid lines and scale bars at 1, 2 or 5 × 10ᵏ (common practice for chart axes), so labels stay
// short: one ladder for the pane's graphs, the view's grid and the exported figures.

export interface Ticks { step: number; values: number[] }

/** How niceStep rounds to the 1-2-5 ladder: to the nearest step, the largest at or below, or the smallest at or above. */
export type StepRounding = 'nearest' | 'down' | 'up';

/**
 * Returns the 1, 2 or 5 × 10ᵏ step for span/target (positive span): the nearest (axes of the pane's graphs,
 * e.g. 0.2, 5, 2000), the largest at or below (figure scale bars and axes), or the smallest at or above
 * (grid lines of the view); NaN for a non-positive or non-finite span.
 */
export function niceStep(span: number, target = 1, rounding: StepRounding = 'nearest'): number {
  const raw = span / Math.max(1, target);
  if (!(raw > 0) || !Number.isFinite(raw)) return NaN;
  const power = Math.pow(10, Math.floor(Math.log10(raw)));
  const m = raw / power;
  if (rounding === 'down') return (m >= 5 * (1 - 1e-12) ? 5 : m >= 2 * (1 - 1e-12) ? 2 : 1) * power;
  if (rounding === 'up') {
    for (const k of [1, 2, 5, 10]) if (k >= m * (1 - 1e-12)) return k * power;
    return 10 * power;
  }
  return (m < 1.5 ? 1 : m < 3.5 ? 2 : m < 7.5 ? 5 : 10) * power;
}

/** Returns the tick values k·step inside [lo, hi] (multiples, not running sums, trimmed to 12 digits: 3 × 0.1 is 0.3). */
export function stepMultiples(lo: number, hi: number, step: number): number[] {
  const values: number[] = [];
  if (!(step > 0) || !Number.isFinite(lo) || !Number.isFinite(hi)) return values;
  const first = Math.ceil(lo / step - 1e-9);
  const last = Math.floor(hi / step + 1e-9);
  for (let k = first; k <= last; k++) values.push(Number((k * step).toPrecision(12)) || 0);
  return values;
}

/** Ticks inside [min, max] at a 1-2-5 step giving about `target` intervals; a single tick for an empty or bad range. */
export function niceTicks(min: number, max: number, target = 5): Ticks {
  if (!Number.isFinite(min) || !Number.isFinite(max)) return { step: NaN, values: [] };
  if (!(max > min)) return { step: 0, values: [min] };
  const step = niceStep(max - min, target);
  return { step, values: stepMultiples(min, max, step) };
}

/** The range widened outwards to whole steps of its nice step (for "zoom to data" domains). */
export function niceDomain(min: number, max: number, target = 5): [number, number] {
  if (!(max > min)) {
    const pad = Math.abs(min) > 0 ? Math.abs(min) * 0.1 : 1;
    return [min - pad, max + pad];
  }
  const step = niceStep(max - min, target);
  return [Math.floor(min / step) * step, Math.ceil(max / step) * step];
}

/** Returns the decimals needed to tell ticks `step` apart (0 for steps of 1 or more). */
export function stepDecimals(step: number): number {
  return Math.max(0, -Math.floor(Math.log10(step) + 1e-9));
}

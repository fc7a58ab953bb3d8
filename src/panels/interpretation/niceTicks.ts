// Axis ticks at 1, 2 or 5 × 10ᵏ (common practice for chart axes), so tick labels stay short.

export interface Ticks { step: number; values: number[] }

/** The 1-2-5 step nearest to span/target (positive span), e.g. 0.2, 5, 2000. */
export function niceStep(span: number, target: number): number {
  const raw = span / Math.max(1, target);
  const power = Math.pow(10, Math.floor(Math.log10(raw)));
  const m = raw / power;
  const nice = m < 1.5 ? 1 : m < 3.5 ? 2 : m < 7.5 ? 5 : 10;
  return nice * power;
}

/** Ticks inside [min, max] at a 1-2-5 step giving about `target` intervals; a single tick for an empty or bad range. */
export function niceTicks(min: number, max: number, target = 5): Ticks {
  if (!Number.isFinite(min) || !Number.isFinite(max)) return { step: NaN, values: [] };
  if (!(max > min)) return { step: 0, values: [min] };
  const step = niceStep(max - min, target);
  const first = Math.ceil(min / step - 1e-9);
  const last = Math.floor(max / step + 1e-9);
  const values: number[] = [];
  // Multiply rather than accumulate so that 0.1 + 0.2 rounding does not creep into the labels.
  for (let k = first; k <= last; k++) values.push(Number((k * step).toPrecision(12)));
  return { step, values };
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

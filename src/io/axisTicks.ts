// Axis ticks for exported figures: 1-2-5 steps, widened until the labels fit side by side.
import { niceStep } from './formatNumber';
import { maxOf } from '../core/stats/minMax';

const nextStep = (s: number): number => {
  const p = 10 ** Math.floor(Math.log10(s) + 1e-9);
  const f = Math.round(s / p);
  return (f < 2 ? 2 : f < 5 ? 5 : 10) * p;
};

/**
 * Returns tick values in [lo, hi] at a 1-2-5 step giving at most `target` ticks, widened until every label
 * (`label(v)`, about `charPx` per character plus a gap) fits in `lengthPx`; [] for an empty or non-finite range.
 */
export function axisTicks(lo: number, hi: number, lengthPx: number, label: (v: number) => string, charPx: number, target = 5): number[] {
  if (!(hi > lo) || !Number.isFinite(lo) || !Number.isFinite(hi)) return [];
  let step = niceStep((hi - lo) / Math.max(1, target - 1));
  for (let guard = 0; guard < 40; guard++) {
    const out: number[] = [];
    // Multiples of the step (not running sums), trimmed to 12 digits: 3 × 0.1 is 0.3, not 0.30000000000000004.
    for (let k = Math.ceil(lo / step - 1e-9); k * step <= hi + step * 1e-9; k++) out.push(Number((k * step).toPrecision(12)) || 0);
    const widest = maxOf(out.map((v) => label(v).length), 0) * charPx + 2 * charPx;
    if (out.length <= target && out.length * widest <= lengthPx) return out;
    step = nextStep(step);
  }
  return [];
}

// Axis ticks for the exported section's distance and elevation axes: 1-2-5 steps, widened until the labels fit
// side by side. (The area–depth graph has its own rule, shared with the pane: format/areaDepthAxes.ts.)
import { niceStep, stepMultiples } from '../format/niceTicks';

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
  let step = niceStep((hi - lo) / Math.max(1, target - 1), 1, 'down');
  for (let guard = 0; guard < 40; guard++) {
    const out = stepMultiples(lo, hi, step);
    let longest = 0;
    for (const v of out) longest = Math.max(longest, label(v).length);
    const widest = longest * charPx + 2 * charPx;
    if (out.length <= target && out.length * widest <= lengthPx) return out;
    step = nextStep(step);
  }
  return [];
}

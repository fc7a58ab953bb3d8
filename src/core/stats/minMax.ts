// Smallest and largest of a list by a loop. Spreading a list into Math.min passes every value as an argument on
// the call stack and throws RangeError past roughly 100,000 of them (V8), which blanked the page with one
// densely traced line; a loop has no such limit. Lint forbids the spread form (eslint.config.js).

/**
 * Returns [smallest, largest] of `values`, ignoring nothing (a NaN makes both NaN, as Math.min/max do).
 * An empty list gives [Infinity, -Infinity], the same as Math.min() and Math.max() with no arguments.
 */
export function minMax(values: ArrayLike<number>): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (v < lo) lo = v;
    if (v > hi) hi = v;
    if (v !== v) return [NaN, NaN];
  }
  return [lo, hi];
}

/** Returns the smallest of `values` and the extra numbers given (Infinity when there is none); NaN as Math.min. */
export function minOf(values: ArrayLike<number>, ...also: number[]): number {
  let lo = Infinity;
  for (const v of also) lo = v < lo || v !== v ? v : lo;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (v !== v) return NaN;
    if (v < lo) lo = v;
  }
  return lo !== lo ? NaN : lo;
}

/** Returns the largest of `values` and the extra numbers given (-Infinity when there is none); NaN as Math.max. */
export function maxOf(values: ArrayLike<number>, ...also: number[]): number {
  let hi = -Infinity;
  for (const v of also) hi = v > hi || v !== v ? v : hi;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (v !== v) return NaN;
    if (v > hi) hi = v;
  }
  return hi !== hi ? NaN : hi;
}

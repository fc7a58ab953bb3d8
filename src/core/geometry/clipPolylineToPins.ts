import { clipAndMeasure } from './clipAndMeasure';

// Clip a horizon or regional at its exact crossings with the vertical pins x = pL and x = pR
// (docs/method.md §Pins, regional and excess area: "each line must cross each pin exactly once"). Contacts with each pin are counted
// so a line that misses a pin, touches it, or folds back across it is reported, never guessed.

/** A polyline clipped to the pins, running from x = pL (first vertex, exact) to x = pR (last vertex, exact). */
export interface ClippedPolyline {
  xs: Float64Array;
  zs: Float64Array;
  /** Per clipped segment k (vertex k to k+1): 1 when it lies on a projected segment of the input. */
  projected: Uint8Array;
  /** Per clipped vertex: fractional position in the input line (i + t between input vertices i and i+1). */
  source: Float64Array;
  /** True when the input ran from the right pin to the left pin and was reversed. */
  reversed: boolean;
}

export interface PinClip {
  /** Separate contacts with the left / right pin line (crossings, touches, runs along it). */
  leftContacts: number;
  rightContacts: number;
  /** The clipped line, or null unless both contact counts are exactly 1. */
  clipped: ClippedPolyline | null;
}

/** Clip xs/zs to [pL, pR] at the exact pin crossings (reversing a right-to-left line); clipped is null unless each pin is met exactly once. */
export function clipPolylineToPins(
  xs: ArrayLike<number>,
  zs: ArrayLike<number>,
  pL: number,
  pR: number,
  segmentProjected?: ArrayLike<number>,
): PinClip {
  // One implementation for the analysis and the drawing code: the clip with its measures, measures dropped.
  return clipAndMeasure(xs, zs, pL, pR, segmentProjected).clip;
}

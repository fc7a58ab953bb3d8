import { sweepSelfCrossing } from './sweepSelfCrossing';

// The self-crossing test of a long line can take a tenth of a second or more (sweepSelfCrossing on a densely traced
// steep limb), too long for a page that re-analyses on every edit. So its verdicts are remembered by the line's
// content (its vertices, not the array), and a caller may hand long lines to someone else to test (the app: a worker)
// and be told "pending" meanwhile; the verdict is recorded when it comes back. Without such a helper (the command
// line, tests, workers) the test runs here, as before.

/** A crossing as sweepSelfCrossing returns it (the two segment indices), or null for none. */
export type CrossingVerdict = [number, number] | null;

/** Asks for the line to be tested elsewhere; its verdict is handed back through recordCrossingVerdict(key, …). */
export type CrossingDeferral = (key: string, xs: Float64Array, zs: Float64Array) => void;

const KEEP = 64;
const verdicts = new Map<string, CrossingVerdict>();
const pending = new Set<string>();
let deferral: { defer: CrossingDeferral; minVertices: number } | null = null;
let version = 0;

const bits = new Float64Array(1);
const words = new Uint32Array(bits.buffer);

/** A key for the line's vertices: their count and two 32-bit hashes (FNV-1a and a multiplicative one) of every coordinate's bits. */
export function crossingKey(xs: ArrayLike<number>, zs: ArrayLike<number>): string {
  const n = Math.min(xs.length, zs.length);
  let a = 0x811c9dc5;
  let b = 0x9e3779b9;
  // Measured hot path (every analysis of a long line keys it): x then z of each vertex, written out rather than in an
  // inner loop over the two arrays, which ran at a third of the speed while the page was still cold.
  for (let i = 0; i < n; i++) {
    bits[0] = xs[i];
    let lo = words[0], hi = words[1];
    a = Math.imul(Math.imul(a ^ lo, 0x01000193) ^ hi, 0x01000193);
    b = Math.imul(b + lo, 0x85ebca6b) ^ (b >>> 13);
    b = Math.imul(b + hi, 0xc2b2ae35) ^ (b >>> 16);
    bits[0] = zs[i];
    lo = words[0];
    hi = words[1];
    a = Math.imul(Math.imul(a ^ lo, 0x01000193) ^ hi, 0x01000193);
    b = Math.imul(b + lo, 0x85ebca6b) ^ (b >>> 13);
    b = Math.imul(b + hi, 0xc2b2ae35) ^ (b >>> 16);
  }
  return `${n}:${(a >>> 0).toString(36)}:${(b >>> 0).toString(36)}`;
}

/** Lines of at least `minVertices` vertices are handed to `defer` instead of being tested here; null tests every line here. */
export function setCrossingDeferral(defer: CrossingDeferral | null, minVertices = 0): void {
  deferral = defer ? { defer, minVertices } : null;
}

/** Records the verdict for a key handed out by the deferral, and bumps crossingVerdictsVersion when the line crosses itself. */
export function recordCrossingVerdict(key: string, verdict: CrossingVerdict): void {
  pending.delete(key);
  if (verdicts.size >= KEEP) verdicts.delete(verdicts.keys().next().value as string);
  verdicts.set(key, verdict);
  // While pending the line was measured as not crossing itself: only a crossing makes those results out of date
  // (a big document's every line coming back clear would otherwise re-run its whole analysis for nothing).
  if (verdict !== null) version++;
}

/** Bumped whenever a deferred verdict that finds a crossing arrives: results computed while it was pending are out of date. */
export function crossingVerdictsVersion(): number {
  return version;
}

/** Whether the line crosses itself (the segments, as sweepSelfCrossing), or 'pending' while a long line is being tested elsewhere. */
export function crossingVerdict(xs: ArrayLike<number>, zs: ArrayLike<number>): CrossingVerdict | 'pending' {
  const n = Math.min(xs.length, zs.length);
  if (!deferral || n < deferral.minVertices) return sweepSelfCrossing(xs, zs);
  const key = crossingKey(xs, zs);
  const known = verdicts.get(key);
  if (known !== undefined) return known;
  if (!pending.has(key)) {
    pending.add(key);
    deferral.defer(key, Float64Array.from(xs), Float64Array.from(zs));
  }
  return 'pending';
}

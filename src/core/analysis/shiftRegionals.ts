import type { PreparedSection } from './prepareSection';

// Exact re-evaluation of the per-horizon measures when every regional is moved by a linear
// function f(x) = δᵢ + t·(x − xPivot) and, optionally, the whole section is rescaled.
// Moving the regional by f changes the loop integral by −∫_{pL}^{pR} f dx, exact for any
// polyline because f is linear (our derivation, docs/method.md §Sensitivity to the regional);
// r moves by the mean of f over the pins. Depths keep the prepared reference elevation fixed,
// so a common offset δ gives A' = A − W0·δ and h' = h − δ as in docs/method.md §Sensitivity to the regional.

/** How to move the regionals (section units; tilt is dz/dx) and rescale (k multiplies x and z). All optional. */
export interface SectionAdjustment {
  /** Common vertical regional offset δ (units), added to each horizon's own offset. */
  regionalOffset?: number;
  /** Per-horizon offsets δᵢ (units), input order. */
  regionalOffsets?: ArrayLike<number>;
  /** Common regional tilt t (dz/dx) about x = tiltPivotX (default: the left pin). */
  regionalTilt?: number;
  tiltPivotX?: number;
  /** Per-horizon additive area changes (units², before scaling), e.g. sampled digitising noise. */
  areaDeltas?: ArrayLike<number>;
  /** Calibration scale k: areas scale by k², lengths and depths by k (default 1). */
  scale?: number;
}

/** Per-horizon measures after an adjustment (input order). */
export interface AdjustedMeasures {
  areas: Float64Array;
  regionalElevations: Float64Array;
  depths: Float64Array;
  regionalLengths: Float64Array;
}

/** Measures of every horizon after moving its regional by δᵢ + t(x − xPivot) (exact); writes into `out` when given (no allocation). */
export function shiftRegionals(prepared: PreparedSection, adj: SectionAdjustment = {}, out?: AdjustedMeasures): AdjustedMeasures {
  const n = prepared.horizons.length;
  const res = out ?? {
    areas: new Float64Array(n), regionalElevations: new Float64Array(n),
    depths: new Float64Array(n), regionalLengths: new Float64Array(n),
  };
  const [pL, pR] = prepared.pins;
  const w0 = prepared.pinWidth;
  const t = adj.regionalTilt ?? 0;
  const xp = adj.tiltPivotX ?? pL;
  const k = adj.scale ?? 1;
  // ∫ t(x − xp) dx over the pins and its mean, computed in pin-relative terms for accuracy.
  const tiltIntegral = (t * ((pR - xp) * (pR - xp) - (pL - xp) * (pL - xp))) / 2;
  const tiltMean = t * ((pL - xp) + w0 / 2);
  for (let i = 0; i < n; i++) {
    const h = prepared.horizons[i];
    const delta = (adj.regionalOffset ?? 0) + (adj.regionalOffsets ? adj.regionalOffsets[i] : 0);
    const area = h.excessArea - delta * w0 - tiltIntegral + (adj.areaDeltas ? adj.areaDeltas[i] : 0);
    const r = h.regionalElevation + delta + tiltMean;
    res.areas[i] = k * k * area;
    res.regionalElevations[i] = k * r;
    res.depths[i] = k * (prepared.referenceElevation - r);
    res.regionalLengths[i] = k * (t === 0 ? h.regionalLength : tiltedLength(h.regional.xs, h.regional.zs, t));
  }
  return res;
}

function tiltedLength(xs: Float64Array, zs: Float64Array, t: number): number {
  let sum = 0;
  for (let i = 1; i < xs.length; i++) {
    const dx = xs[i] - xs[i - 1];
    sum += Math.hypot(dx, zs[i] - zs[i - 1] + t * dx);
  }
  return sum;
}

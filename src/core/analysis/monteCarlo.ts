import type { AnySection } from '../model/section';
import type { SectionProblem } from '../model/validateSection';
import { percentile } from '../stats/percentile';
import { seededRandom } from '../stats/seededRandom';
import { areaNoiseFactor } from './areaVertexCoefficients';
import { createEvaluationScratch, evaluateShifted, type QuickDetachment } from './evaluateShifted';
import { prepareHorizon } from './prepareHorizon';
import { prepareSection, type PreparedSection } from './prepareSection';
import type { SectionAdjustment } from './shiftRegionals';
import { projectedSegmentFlags } from './projectedSegmentFlags';
import { sectionPerturbation } from './perturbSection';
import { validateSectionArrays } from '../model/validateSectionArrays';

// Monte Carlo of the detachment (docs/method.md §Sensitivity to the regional: propagate digitising and regional error,
// report P10/P50/P90). Each run draws, in this fixed order: a common regional offset, a common
// regional tilt about the chosen pin, a calibration scale factor, per-horizon regional offsets,
// then the digitising noise — either one normal area change per horizon with variance σ² Σ cᵢ²
// ('analytic', docs/method.md §Area variance of a horizon, exact because the area is linear in z) or σ on every input vertex,
// the faults' vertices too, with the cutoffs moved along with their faults and every horizon re-joined and re-clipped
// ('vertices', the brute force the analytic method is checked against).

export interface MonteCarloOptions {
  runs: number;
  seed: number;
  /** Vertical digitising error per vertex, σ (units). */
  sigmaVertex?: number;
  /** Common regional offset, σ (units). */
  sigmaOffset?: number;
  /** Independent regional offset per horizon, σ (units). */
  sigmaHorizonOffset?: number;
  /** Common regional tilt, σ (dz/dx). */
  sigmaTilt?: number;
  /** Calibration scale, relative σ (0.01 = 1%). */
  sigmaScale?: number;
  tiltPivot?: 'left' | 'right';
  method?: 'analytic' | 'vertices';
}

export interface SpreadSummary { p10: number; p50: number; p90: number; mean: number; sd: number }

export interface MonteCarloResult {
  runs: number;
  /** Runs with a detachment below the horizons (slope < 0 and a line at all). */
  valid: number;
  /** Share of runs (0…1) without a valid detachment. */
  failedShare: number;
  /** Per run (NaN where the run failed): depth below the reference, elevation, displacement (units). */
  depths: Float64Array;
  elevations: Float64Array;
  displacements: Float64Array;
  depth: SpreadSummary | null;
  elevation: SpreadSummary | null;
  displacement: SpreadSummary | null;
  /** The unperturbed estimate. */
  pointEstimate: QuickDetachment | null;
}

export type MonteCarloOutcome = { ok: true; result: MonteCarloResult } | { ok: false; problems: SectionProblem[] };

/** Seeded Monte Carlo of detachment depth, elevation and displacement (units); input problems as { ok: false }; onProgress(done, total) every ~1% of runs. */
export function monteCarlo(section: AnySection, options: MonteCarloOptions, onProgress?: (done: number, total: number) => void): MonteCarloOutcome {
  const prep = prepareSection(section);
  if (!prep.ok) return { ok: false, problems: prep.problems };
  const p = prep.prepared;
  const runs = Math.max(0, Math.floor(options.runs));
  const rng = seededRandom(options.seed);
  const scratch = createEvaluationScratch(p);
  const n = p.horizons.length;
  const sv = options.sigmaVertex ?? 0;
  const noise = options.method === 'vertices' && sv > 0 ? vertexNoise(section, p, sv) : analyticNoise(section, p, sv);
  const areaDeltas = new Float64Array(n);
  const offsets = new Float64Array(n);
  const adj: SectionAdjustment = { areaDeltas, regionalOffsets: offsets, tiltPivotX: options.tiltPivot === 'right' ? p.pins[1] : p.pins[0] };
  const depths = new Float64Array(runs);
  const elevations = new Float64Array(runs);
  const displacements = new Float64Array(runs);
  const every = Math.max(1, Math.floor(runs / 100));
  let valid = 0;
  for (let r = 0; r < runs; r++) {
    adj.regionalOffset = (options.sigmaOffset ?? 0) * rng.normal();
    adj.regionalTilt = (options.sigmaTilt ?? 0) * rng.normal();
    adj.scale = 1 + (options.sigmaScale ?? 0) * rng.normal();
    for (let i = 0; i < n; i++) offsets[i] = (options.sigmaHorizonOffset ?? 0) * rng.normal();
    const drawn = noise(rng.normal, areaDeltas);
    const q = drawn && adj.scale > 0 ? evaluateShifted(p, adj, scratch) : null;
    if (q && !q.noDetachment && q.detachmentDepth !== null && q.detachmentElevation !== null) {
      depths[r] = q.detachmentDepth;
      elevations[r] = q.detachmentElevation;
      displacements[r] = q.displacement;
      valid++;
    } else {
      depths[r] = elevations[r] = displacements[r] = NaN;
    }
    if (onProgress && ((r + 1) % every === 0 || r + 1 === runs)) onProgress(r + 1, runs);
  }
  return {
    ok: true,
    result: {
      runs, valid, failedShare: runs === 0 ? 0 : (runs - valid) / runs,
      depths, elevations, displacements,
      depth: spread(depths), elevation: spread(elevations), displacement: spread(displacements),
      pointEstimate: evaluateShifted(p),
    },
  };
}

type NoiseDraw = (normal: () => number, out: Float64Array) => boolean;

/** One normal area change per horizon, σ·√(Σ cᵢ²) (docs/method.md §Area variance of a horizon). */
function analyticNoise(section: AnySection, p: PreparedSection, sigma: number): NoiseDraw {
  const sds = p.horizons.map((h) => sigma * Math.sqrt(areaNoiseFactor(h.line, h.inputVertexCount, p.pins)));
  return (normal, out) => {
    for (let i = 0; i < sds.length; i++) out[i] = sds[i] === 0 ? 0 : sds[i] * normal();
    return true;
  };
}

/** σ on every digitised vertex's z, faults included, cutoffs moved with their faults (perturbSection.ts), each horizon re-joined and re-clipped; false when a perturbed section no longer validates or a line no longer crosses the pins once. */
function vertexNoise(section: AnySection, p: PreparedSection, sigma: number): NoiseDraw {
  const perturb = sectionPerturbation(section);
  return (normal, out) => {
    const v = validateSectionArrays(perturb(sigma, normal));
    if (!v.ok) return false;
    let ok = true;
    v.section.horizons.forEach((h, i) => {
      const base = p.horizons[i];
      const flags = projectedSegmentFlags(h.projected, h.lineX.length);
      const join = h.faultSegments ? { faultSegments: h.faultSegments, pieces: h.pieceCount, cutoffs: h.cutoffs } : undefined;
      const again = prepareHorizon(base.name, h.lineX, h.lineZ, h.regionalX, h.regionalZ, p.pins, base.included, flags, p.units, undefined, join);
      if (again.ok) out[i] = again.horizon.excessArea - base.excessArea;
      else ok = false;
    });
    return ok;
  };
}

function spread(values: Float64Array): SpreadSummary | null {
  const ok = Array.from(values).filter((v) => Number.isFinite(v)).sort((a, b) => a - b);
  if (ok.length === 0) return null;
  const mean = ok.reduce((s, v) => s + v, 0) / ok.length;
  const sd = ok.length > 1 ? Math.sqrt(ok.reduce((s, v) => s + (v - mean) ** 2, 0) / (ok.length - 1)) : 0;
  return { p10: percentile(ok, 0.1), p50: percentile(ok, 0.5), p90: percentile(ok, 0.9), mean, sd };
}

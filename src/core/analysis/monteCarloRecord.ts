// What is kept of one finished Monte Carlo run of a scenario (the run itself is core/analysis/monteCarlo):
// its settings, the spread of the detachment it found, and the key of the section it ran on
// (core/model/sectionKey), so that a later state of the section can tell it is stale.
import type { LengthUnit } from '../model/section';

/** P10 / P50 / P90 of one quantity over the valid runs (units). */
export interface Percentiles { p10: number; p50: number; p90: number }

/**
 * One finished Monte Carlo run of a scenario:
 * - `sectionKey`: sectionKey(section) of the analysed section the run used; compare with the current one.
 * - `seed`, `runs`, `method`: the run's settings; `sigmas`: the σ values as entered (vertex, offset and
 *   perHorizonOffset in units; tilt in units per 1000 units; scale in %).
 * - `depth`, `elevation`, `displacement`: percentiles (units), null when no run gave a detachment.
 *   Depths are below `referenceElevation`, the reference of the section the run used.
 * - `failedShare`: share 0…1 of runs without a valid detachment; `finishedAt`: ms since 1970 (Date.now()).
 * - `depths` (per run, NaN where it failed) and `pointDepth` (the unperturbed estimate) for the histogram.
 */
export interface MonteCarloRecord {
  sectionKey: string;
  units: LengthUnit;
  seed: number;
  runs: number;
  method: 'analytic' | 'vertices';
  sigmas: { vertex: number; offset: number; perHorizonOffset: number; tiltPerThousand: number; scalePercent: number };
  referenceElevation: number;
  depth: Percentiles | null;
  elevation: Percentiles | null;
  displacement: Percentiles | null;
  /** Standard deviation of the depth (units), null with `depth`. */
  depthSd: number | null;
  failedShare: number;
  finishedAt: number;
  depths: Float64Array;
  pointDepth: number | null;
}

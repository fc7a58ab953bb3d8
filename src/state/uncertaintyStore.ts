// The session's last uncertainty results per scenario: the Monte Carlo spread and the sensitivity
// amplification 1 + W0/D (METHOD.md, "Sensitivity to the regional"). Not in the document and not
// undoable: they are derived, but too slow to recompute on demand (a run takes seconds), so they are
// kept with the key of the section they were computed from. A result whose key differs from the
// current section's is stale: show it marked as such, never as the current state's spread.
import { create } from 'zustand';
import type { LengthUnit, Section } from '../core/model/section';
import { useDocStore } from './docStore';

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

/** The sensitivity amplification 1 + W0/D of a scenario (null: no detachment), for the section with `sectionKey`. */
export interface AmplificationRecord { sectionKey: string; amplification: number | null; pinWidth: number; displacement: number | null }

export interface UncertaintyState {
  /** Last Monte Carlo result per scenario id. */
  byScenario: Record<string, MonteCarloRecord>;
  /** Last sensitivity amplification per scenario id. */
  amplificationByScenario: Record<string, AmplificationRecord>;
  setMonteCarlo: (scenarioId: string, record: MonteCarloRecord) => void;
  setAmplification: (scenarioId: string, record: AmplificationRecord) => void;
  /** Forget everything (a new or opened project). */
  clear: () => void;
}

export const useUncertaintyStore = create<UncertaintyState>((set) => ({
  byScenario: {},
  amplificationByScenario: {},
  setMonteCarlo: (scenarioId, record) => set((s) => ({ byScenario: { ...s.byScenario, [scenarioId]: record } })),
  setAmplification: (scenarioId, record) => set((s) => {
    const old = s.amplificationByScenario[scenarioId];
    if (old && old.sectionKey === record.sectionKey && old.amplification === record.amplification) return s;
    return { amplificationByScenario: { ...s.amplificationByScenario, [scenarioId]: record } };
  }),
  clear: () => set({ byScenario: {}, amplificationByScenario: {} }),
}));

// Results belong to the project they were run on: a new, opened or restored project starts with none,
// even when its section happens to give the same key (the same section file opened again).
useDocStore.subscribe((s, prev) => {
  if (s.opened !== prev.opened) useUncertaintyStore.getState().clear();
});

// The key hashes every number and name the analysis reads (units, pins, reference, each horizon's
// name, include flag, line, regional and projected runs), so two sections with the same key give the
// same analysis; a hash of the float bits rather than of JSON text so that a drag frame costs one
// pass over the vertices. Memoised per section object (the selectors hand out the same object until
// the document changes).
const keys = new WeakMap<Section, string>();
const f64 = new Float64Array(1);
const u32 = new Uint32Array(f64.buffer);

/** Returns a short text key of everything in the section the analysis depends on; equal sections give equal keys. */
export function sectionKey(section: Section): string {
  const hit = keys.get(section);
  if (hit) return hit;
  // Two 32-bit FNV-1a style lanes with different multipliers: about 2⁻⁶⁴ odds of a chance collision.
  let a = 0x811c9dc5;
  let b = 0x01000193;
  let count = 0;
  const word = (w: number) => {
    a = Math.imul(a ^ w, 0x01000193);
    b = Math.imul(b ^ w, 0x5bd1e995) ^ (b >>> 15);
    count++;
  };
  const num = (v: number) => {
    f64[0] = v;
    word(u32[0]);
    word(u32[1]);
  };
  const text = (t: string) => {
    word(t.length);
    for (let i = 0; i < t.length; i++) word(t.charCodeAt(i));
  };
  text(section.units);
  num(section.pins[0]);
  num(section.pins[1]);
  num(section.referenceElevation ?? NaN);
  for (const h of section.horizons) {
    text(h.name);
    word(h.include === false ? 0 : 1);
    for (const pts of [h.line, h.regional]) {
      word(pts.length);
      for (const p of pts) {
        num(p[0]);
        num(p[1]);
      }
    }
    word(h.projected?.length ?? 0);
    for (const [from, to] of h.projected ?? []) {
      word(from);
      word(to);
    }
  }
  const key = `${(a >>> 0).toString(16)}${(b >>> 0).toString(16).padStart(8, '0')}-${count}`;
  keys.set(section, key);
  return key;
}

/** Whether the record was computed for a section other than the current one (its key differs). */
export function isStale(record: { sectionKey: string }, current: Section): boolean {
  return record.sectionKey !== sectionKey(current);
}

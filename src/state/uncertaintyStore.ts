// The session's last uncertainty results per scenario: the Monte Carlo spread and the sensitivity
// amplification 1 + W0/D (docs/method.md §Sensitivity to the regional). Not in the document and not
// undoable: they are derived, but too slow to recompute on demand (a run takes seconds), so they are
// kept with the key of the section they were computed from. A result whose key differs from the
// current section's is stale: show it marked as such, never as the current state's spread.
import { create } from 'zustand';
import type { MonteCarloRecord } from '../core/analysis/monteCarloRecord';
import { useDocStore } from './docStore';

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

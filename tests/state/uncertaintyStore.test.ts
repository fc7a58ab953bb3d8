// The session store of uncertainty results: a result is kept with the key of the section it was run
// on, and is stale as soon as anything the analysis reads has changed.
import { beforeEach, describe, expect, it } from 'vitest';
import type { Section } from '../../src/core/model/section';
import { emptyProjectDoc } from '../../src/core/model/projectDoc';
import { setUnits } from '../../src/core/model/commands/setUnits';
import { isStale, sectionKey } from '../../src/core/model/sectionKey';
import { useDocStore } from '../../src/state/docStore';
import { useUncertaintyStore } from '../../src/state/uncertaintyStore';
import type { MonteCarloRecord } from '../../src/core/analysis/monteCarloRecord';
import { methodExample } from '../core/analysis/sections';

const clone = (s: Section): Section => JSON.parse(JSON.stringify(s)) as Section;

function record(section: Section, p50: number): MonteCarloRecord {
  return {
    sectionKey: sectionKey(section), units: 'm', seed: 1, runs: 2000, method: 'analytic',
    sigmas: { vertex: 10, offset: 20, perHorizonOffset: 0, tiltPerThousand: 0, scalePercent: 0 }, referenceElevation: 0,
    depth: { p10: p50 - 100, p50, p90: p50 + 100 }, elevation: { p10: -p50 - 100, p50: -p50, p90: -p50 + 100 },
    displacement: { p10: 900, p50: 1000, p90: 1100 }, depthSd: 80, failedShare: 0, finishedAt: 0, depths: new Float64Array([p50]), pointDepth: p50,
  };
}

describe('useUncertaintyStore', () => {
  beforeEach(() => useUncertaintyStore.getState().clear());

  it('keeps the last Monte Carlo result per scenario, stale once the section changes', () => {
    const s = methodExample();
    const { setMonteCarlo } = useUncertaintyStore.getState();
    setMonteCarlo('scenario-1', record(s, 3000));
    setMonteCarlo('scenario-2', record(s, 2500));
    setMonteCarlo('scenario-1', record(s, 3100));
    const { byScenario } = useUncertaintyStore.getState();
    expect(byScenario['scenario-1'].depth!.p50).toBe(3100);
    expect(byScenario['scenario-2'].depth!.p50).toBe(2500);
    expect(isStale(byScenario['scenario-1'], clone(s))).toBe(false);
    const moved = clone(s);
    moved.horizons.forEach((h) => h.regional.forEach((p) => { p[1] += 10; }));
    expect(isStale(byScenario['scenario-1'], moved)).toBe(true);
  });

  it('keeps the amplification, and leaves the store as it is when nothing changed', () => {
    const s = methodExample();
    const { setAmplification } = useUncertaintyStore.getState();
    // the synthetic example of docs/method.md §Check values: 1 + W0/D = 1 + 10 000 / 1000 = 11.
    setAmplification('scenario-1', { sectionKey: sectionKey(s), amplification: 11, pinWidth: 10_000, displacement: 1000 });
    const before = useUncertaintyStore.getState().amplificationByScenario;
    setAmplification('scenario-1', { sectionKey: sectionKey(s), amplification: 11, pinWidth: 10_000, displacement: 1000 });
    expect(useUncertaintyStore.getState().amplificationByScenario).toBe(before);
    expect(before['scenario-1'].amplification).toBe(11);
  });

  it('forgets every result when the project is replaced (Project ▸ New, Open, restore), but not on an edit, undo or redo', () => {
    const s = methodExample();
    const store = () => useUncertaintyStore.getState();
    const fill = () => {
      store().setMonteCarlo('scenario-1', record(s, 3000));
      store().setAmplification('scenario-1', { sectionKey: sectionKey(s), amplification: 11, pinWidth: 10_000, displacement: 1000 });
    };
    useDocStore.getState().replace(emptyProjectDoc());
    fill();
    // Edits and their undo/redo keep the results (they are then marked stale by their key, not dropped).
    useDocStore.getState().apply((d) => setUnits(d, 'ft'));
    useDocStore.getState().undo();
    useDocStore.getState().redo();
    expect(Object.keys(store().byScenario)).toEqual(['scenario-1']);
    expect(Object.keys(store().amplificationByScenario)).toEqual(['scenario-1']);
    // A new project has the same scenario id ("scenario-1") as the old one: nothing of the old may show.
    useDocStore.getState().replace(emptyProjectDoc());
    expect(store().byScenario).toEqual({});
    expect(store().amplificationByScenario).toEqual({});
    // The same again for a document opened from a file whose section gives the very same key.
    fill();
    useDocStore.getState().replace({ ...emptyProjectDoc(), title: 'Opened' });
    expect(store().byScenario['scenario-1']).toBeUndefined();
    expect(isStale(record(s, 3000), clone(s))).toBe(false);
  });
});

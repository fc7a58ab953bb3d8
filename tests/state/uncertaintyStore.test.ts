// The session store of uncertainty results: a result is kept with the key of the section it was run
// on, and is stale as soon as anything the analysis reads has changed (journey P2 #1).
import { beforeEach, describe, expect, it } from 'vitest';
import type { Section } from '../../src/core/model/section';
import { isStale, sectionKey } from '../../src/core/model/sectionKey';
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
    // METHOD.md synthetic example: 1 + W0/D = 1 + 10 000 / 1000 = 11.
    setAmplification('scenario-1', { sectionKey: sectionKey(s), amplification: 11, pinWidth: 10_000, displacement: 1000 });
    const before = useUncertaintyStore.getState().amplificationByScenario;
    setAmplification('scenario-1', { sectionKey: sectionKey(s), amplification: 11, pinWidth: 10_000, displacement: 1000 });
    expect(useUncertaintyStore.getState().amplificationByScenario).toBe(before);
    expect(before['scenario-1'].amplification).toBe(11);
  });
});

import { afterEach, describe, expect, it, vi } from 'vitest';
import { monteCarlo } from '../../src/core/analysis/monteCarlo';
import { faultedSection } from '../../src/core/forward/faultedSection';
import type { XZ } from '../../src/core/model/section';
import type { MonteCarloReply, MonteCarloRequest } from '../../src/panels/interpretation/monteCarloMessages';

// The app runs the Monte Carlo in a worker: the section reaches it as a structured clone of the panel's
// section, faults included. The source is the faulted forward model (vertical simple shear, Gibbs 1983;
// src/core/forward/faultedSection.ts), a thrust of D = 1500 m over a ramp.
const RAMP: XZ[] = [[-8000, -3000], [6000, -3000], [8000, -1800], [9000, -600], [10500, 800], [30000, 800]];

afterEach(() => {
  vi.unstubAllGlobals();
  vi.resetModules();
});

describe('monteCarlo.worker', () => {
  it('runs the vertex method on a faulted section sent as a message, every realisation succeeding', async () => {
    const { section, truth } = faultedSection({
      units: 'm', pins: [0, 20000], displacement: 1500, fault: RAMP,
      horizons: [500, -500, -1500, -2500].map((r, i) => ({ name: `L${i}`, regionalElevation: r })),
    });
    const replies: MonteCarloReply[] = [];
    const fakeSelf: { postMessage: (m: MonteCarloReply) => void; onmessage: ((e: { data: MonteCarloRequest }) => void) | null } = {
      postMessage: (m) => replies.push(m), onmessage: null,
    };
    vi.stubGlobal('self', fakeSelf);
    await import('../../src/panels/interpretation/monteCarlo.worker');
    const options = { runs: 100, seed: 4, sigmaVertex: 5, method: 'vertices' as const };
    const sent = structuredClone({ section, options });
    expect(sent.section.faults).toHaveLength(1);
    fakeSelf.onmessage!({ data: sent });
    const done = replies.find((m) => m.type === 'done');
    if (!done || done.type !== 'done') throw new Error(`no result: ${JSON.stringify(replies.filter((m) => m.type === 'failed'))}`);
    expect(done.valid).toBe(100);
    expect(done.failedShare).toBe(0);
    expect(done.pointDepth).toBeCloseTo(truth.detachmentDepth, 6);
    const direct = monteCarlo(section, options);
    if (!direct.ok) throw new Error('direct run failed');
    expect(Array.from(done.depths)).toEqual(Array.from(direct.result.depths));
  });
});

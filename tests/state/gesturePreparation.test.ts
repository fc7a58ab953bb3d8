// The next drag's start is prepared once the document settles, and never for the documents a gesture passes
// through; a drag from a prepared document gives the full analysis's numbers (the gesture fast path is
// checked against analyseSection in selectLiveAnalysis.test.ts).
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { offsetRegionals } from '../../src/core/model/commands/offsetRegionals';
import { emptyProjectDoc, type ProjectDoc } from '../../src/core/model/projectDoc';
import { useDocStore } from '../../src/state/docStore';
import { startGesturePreparation } from '../../src/state/gesturePreparation';
import { preparedForGesture, selectAnalysis, selectLiveAnalysis } from '../../src/state/selectors';

/** Two invented folded horizons of 500 vertices on a 1 px = 2 m calibration, regionals and pins set. */
function doc(): ProjectDoc {
  const d = emptyProjectDoc();
  d.calibration = { kind: 'axes', xPoints: [{ u: 0, v: 0, value: 0 }, { u: 1000, v: 0, value: 2000 }], zPoints: [{ u: 0, v: 0, value: 0 }, { u: 0, v: 1000, value: -2000 }] };
  for (let k = 0; k < 2; k++) {
    const pointsPx: [number, number][] = Array.from({ length: 500 }, (_, i) => [i * 2, 300 + 200 * k - (60 + 80 * k) * Math.sin((Math.PI * i) / 499)]);
    d.horizons.push({ id: `h${k}`, name: `H${k}`, colour: '#000000', visible: true, locked: false, pointsPx, projected: [], joins: [] });
    d.scenarios[0].regionals[`h${k}`] = [[0, 300 + 200 * k], [998, 300 + 200 * k]];
  }
  d.scenarios[0].pinsPx = [[20, 0], [980, 0]];
  return d;
}

describe('startGesturePreparation', () => {
  let stop: () => void = () => undefined;
  beforeEach(() => {
    vi.useFakeTimers();
  });
  afterEach(() => {
    stop();
    vi.useRealTimers();
  });

  it('prepares a settled document before any drag, and not the documents a drag passes through', () => {
    const d = doc();
    useDocStore.getState().replace(d);
    stop = startGesturePreparation();
    expect(preparedForGesture(d)).toBe(false);
    vi.advanceTimersByTime(1000);
    expect(preparedForGesture(d)).toBe(true);

    const store = useDocStore.getState();
    store.beginGesture();
    store.apply((x) => offsetRegionals(x, ['h0', 'h1'], -4));
    const mid = useDocStore.getState().doc;
    vi.advanceTimersByTime(1000);
    expect(preparedForGesture(mid)).toBe(false);
    // The live numbers mid-drag are the full analysis's (to rounding).
    const live = selectLiveAnalysis(mid, d).outcome;
    const full = selectAnalysis(mid).outcome;
    const before = selectAnalysis(d).outcome;
    if (!live?.ok || !full?.ok || !before?.ok) throw new Error('no analysis');
    live.analysis.horizons.forEach((h, i) => expect(h.excessArea).toBeCloseTo(full.analysis.horizons[i].excessArea, 6));
    // The regionals did move: the areas are not the start's.
    expect(live.analysis.horizons[0].excessArea).not.toBeCloseTo(before.analysis.horizons[0].excessArea, 0);
    useDocStore.getState().endGesture();
    vi.advanceTimersByTime(1000);
    expect(preparedForGesture(useDocStore.getState().doc)).toBe(true);
  });
});

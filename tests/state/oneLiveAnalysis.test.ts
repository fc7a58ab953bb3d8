// Every view and export reads one live analysis: the results strip, the interpretation pane, the
// area–depth graph, the detachment line on the section and the results CSV give the same detachment
// depth and the same left-out horizons, during a regional drag (through the real document store and
// its gesture) and after it, for the two cases where separate computations used to disagree: a
// regional edited so that it crosses itself, and a regional that misses a pin.
// Check values: the analytic forward model of tests/fixtures/forwardModel/forwardModel.ts (Epard & Groshong,
// 1993, A = D·(zd − h)); leaving out the deepest horizon keeps the other three on that line.
import { afterEach, describe, expect, it } from 'vitest';
import { setRegional } from '../../src/core/model/commands/setRegional';
import { emptyProjectDoc } from '../../src/core/model/projectDoc';
import { detachmentTrace } from '../../src/canvas/detachmentTrace';
import { resultsCsv } from '../../src/io/exportTables';
import { scenarioAnalysisOf } from '../../src/panels/interpretation/useScenarioAnalysis';
import { liveResults } from '../../src/panels/workspace/liveResults';
import { useDocStore } from '../../src/state/docStore';
import { selectAnalysis, selectLiveAnalysis } from '../../src/state/selectors';
import { forwardModelDoc, px } from '../fixtures/forwardModel/forwardModel';

// H4's regional, edited to run right, double back and run right again: it crosses itself between the pins.
const crossing: [number, number][] = [px(-800, -2000), px(6000, -2000), px(3000, -2100), px(4000, -1900), px(10_800, -2000)];
// H4's regional, edited to stop at x = 9500 m, short of the right pin.
const short: [number, number][] = [px(-800, -2000), px(9500, -2000)];

interface Views { strip: number | null; pane: number | null; graph: number | null; line: number | null; csv: number | null; stripLeftOut: string[]; paneLeftOut: string[]; csvHorizons: string[] }

/** What each view shows for the store's current document, read the way each view reads it. */
function views(): Views {
  const { doc, gestureStart } = useDocStore.getState();
  const strip = liveResults(doc, gestureStart);
  const pane = scenarioAnalysisOf(selectLiveAnalysis(doc, gestureStart));
  const live = selectLiveAnalysis(doc, gestureStart);
  const trace = live.docSection.ok && live.outcome?.ok ? detachmentTrace(live.docSection.section, live.outcome.analysis) : null;
  // Exports are made outside gestures, from the settled document.
  const csv = gestureStart ? null : resultsCsv(doc, selectAnalysis(doc));
  const csvDepth = csv?.split('\n').find((l) => l.startsWith('detachment_depth_m,'))?.split(',')[1];
  return {
    strip: strip.ready ? strip.detachmentDepth : null,
    pane: pane.analysis?.areaDepth?.detachmentDepth ?? null,
    graph: pane.series ? pane.series.referenceElevation - (pane.analysis?.areaDepth?.detachmentElevation ?? NaN) : null,
    line: trace ? trace.depth : null,
    csv: csvDepth === undefined ? null : Number(csvDepth),
    stripLeftOut: strip.horizons.filter((h) => h.leftOutReason !== null).map((h) => `${h.name}: ${h.leftOutReason}`),
    paneLeftOut: pane.leftOut.map((h) => `${h.name}: ${h.reason}`),
    csvHorizons: csv ? csv.split('\n').filter((l) => /^H\d,/.test(l)).map((l) => l.split(',')[0]) : [],
  };
}

function expectAgree(v: Views, leftOutReason: RegExp, settled: boolean) {
  expect(v.strip).toBeCloseTo(3000, 6);
  for (const d of [v.pane, v.graph, v.line]) expect(d).toBeCloseTo(v.strip!, 9);
  if (settled) {
    expect(v.csv).toBeCloseTo(v.strip!, 6);
    expect(v.csvHorizons).toEqual(['H1', 'H2', 'H3']);
  }
  expect(v.stripLeftOut).toEqual(v.paneLeftOut);
  expect(v.paneLeftOut).toHaveLength(1);
  expect(v.paneLeftOut[0]).toMatch(/^H4: /);
  expect(v.paneLeftOut[0]).toMatch(leftOutReason);
}

afterEach(() => useDocStore.getState().replace(emptyProjectDoc()));

describe('one live analysis read by every view', () => {
  for (const [name, regional, reason] of [
    ['a regional edited to cross itself', crossing, /crosses itself/],
    ['a regional that misses a pin', short, /does not reach the right pin/],
  ] as const) {
    it(`strip, pane, graph, detachment line and CSV agree during and after a drag that gives ${name}`, () => {
      const store = useDocStore.getState();
      store.replace(forwardModelDoc());
      // Before: all four horizons on the forward model's line.
      const before = views();
      expect(before.strip).toBeCloseTo(3000, 6);
      expect(before.pane).toBeCloseTo(3000, 6);
      expect(before.paneLeftOut).toEqual([]);
      // During the gesture (the fast path is prepared from its start).
      store.beginGesture();
      store.apply((d) => setRegional(d, 'h3', [px(-800, -1500), px(10_800, -1500)]));
      store.apply((d) => setRegional(d, 'h4', regional.map(([u, v]) => [u, v])));
      expect(useDocStore.getState().gestureStart).not.toBeNull();
      expectAgree(views(), reason, false);
      // After it, with the exports.
      useDocStore.getState().endGesture();
      expect(useDocStore.getState().gestureStart).toBeNull();
      expectAgree(views(), reason, true);
      // The strip's note reads as one sentence: the reason in brackets without its own full stop ("pin.).").
      const { doc } = useDocStore.getState();
      const note = liveResults(doc).ready ? (liveResults(doc) as { note: string | null }).note : null;
      const paneReason = scenarioAnalysisOf(selectLiveAnalysis(doc, null)).leftOut[0].reason;
      expect(note).toBe(`Left out: H4 (${paneReason.replace(/\.$/, '')}).`);
      expect(note).not.toMatch(/\.\)/);
    });
  }
});

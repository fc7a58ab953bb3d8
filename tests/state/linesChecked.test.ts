// Exports and runs on the numbers wait for the long lines' self-crossing checks (src/state/linesChecked.ts), then
// read the analysis again, so a line found to cross itself is left out, with the reason, as the pane shows it.
// "Crosses" is checked independently with @turf/kinks (a general-purpose library from the registry); the other
// horizons are the forward model of tests/fixtures/forwardModel/forwardModel.ts (docs/method.md §Forward models).
import { lineString } from '@turf/helpers';
import kinks from '@turf/kinks';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { sweepSelfCrossing } from '../../src/core/geometry/sweepSelfCrossing';
import type { ProjectDoc } from '../../src/core/model/projectDoc';
import { moveVertex } from '../../src/core/model/commands/moveVertex';
import type { SelfCrossingReply, SelfCrossingRequest } from '../../src/io/workers/selfCrossing.worker';
import { resultsCsv, sectionFileText } from '../../src/io/exportTables';
import { renderSectionSvgParts } from '../../src/io/renderSectionSvg';
import { resultsTsv } from '../../src/panels/interpretation/resultsTsv';
import { startCrossingChecks, stopCrossingChecks, useCrossingChecks, type CrossingWorker } from '../../src/state/crossingChecks';
import { useDocStore } from '../../src/state/docStore';
import { afterLinesChecked, linesChecked, pendingLineChecks } from '../../src/state/linesChecked';
import { selectAnalysis } from '../../src/state/selectors';
import { useSessionStore } from '../../src/state/sessionStore';
import { forwardModelDoc, px } from '../fixtures/forwardModel/forwardModel';

/** A steep limb of n vertices between the pins (z falls at every vertex), offset by `shift` m so each test has lines of its own; `loop` throws a stretch back across it. */
function limbLine(n: number, loop: boolean, shift: number): [number, number][] {
  const line: [number, number][] = [[-800, -2500], [1000 + shift, -2500]];
  for (let i = 1; i <= n; i++) line.push([1000 + shift + (500 * i) / n + 0.3 * Math.sin(i * 0.7), -2500 - (1500 * i) / (n + 1)]);
  if (loop) {
    const m = 2 + Math.floor(n / 2);
    line[m] = [line[m - 2][0] - 5, line[m - 3][1] + 1];
    line[m + 1] = [line[m - 2][0] + 5, line[m + 1][1]];
  }
  line.push([10_800, -4000]);
  return line;
}

/** Four horizons of the forward model (D = 1000 m, detachment at −3500 m) and the steep limb "Limb". */
function doc(limb: [number, number][]): ProjectDoc {
  const d = forwardModelDoc();
  d.horizons.push({ id: 'limb', name: 'Limb', colour: '#000000', visible: true, locked: false, projected: [], joins: [], pointsPx: limb.map(([x, z]) => px(x, z)) });
  d.scenarios[0].regionals.limb = [px(-800, -2500), px(10_800, -2500)];
  return d;
}

/** Stands in for the worker: holds what it is sent until told to answer (as the worker does, with sweepSelfCrossing). */
class HeldWorker implements CrossingWorker {
  onmessage: ((e: MessageEvent<SelfCrossingReply>) => void) | null = null;
  onerror: ((e: ErrorEvent) => void) | null = null;
  held: SelfCrossingRequest[] = [];
  postMessage(m: SelfCrossingRequest): void { this.held.push(m); }
  terminate(): void {}
  /** Answers the first `count` lines held (default all). */
  answer(count = this.held.length): void {
    for (const r of this.held.splice(0, count)) this.onmessage?.({ data: { key: r.key, verdict: sweepSelfCrossing(r.xs, r.zs) } } as MessageEvent<SelfCrossingReply>);
  }
}

const settled = async () => { for (let i = 0; i < 5; i++) await Promise.resolve(); };
/** Whether the promise has resolved yet, and to what. */
function watch<T>(p: Promise<T>): { done: boolean; value?: T } {
  const w: { done: boolean; value?: T } = { done: false };
  void p.then((v) => { w.done = true; w.value = v; });
  return w;
}

let worker: HeldWorker;
let shift = 0;
beforeEach(() => {
  worker = new HeldWorker();
  startCrossingChecks(() => worker);
  shift += 7;
});
afterEach(() => {
  stopCrossingChecks();
  useSessionStore.getState().setBusy(null);
});

describe('linesChecked: exports wait for the long lines’ self-crossing checks', () => {
  it('the test limb crosses itself and its unlooped twin does not (turf kinks)', () => {
    const kinked = (l: [number, number][]) => kinks(lineString(l)).features.length > 0;
    expect(kinked(limbLine(3000, true, 0))).toBe(true);
    expect(kinked(limbLine(3000, false, 0))).toBe(false);
  });

  it('holds until the verdict, then gives the numbers with the crossing limb left out and its reason', async () => {
    useDocStore.getState().replace(doc(limbLine(3000, true, shift)));
    // Without the wait the numbers would carry the limb: it is measured meanwhile, in the table as a horizon.
    expect(pendingLineChecks('active')).toBe(1);
    const early = resultsCsv(useDocStore.getState().doc, selectAnalysis(useDocStore.getState().doc))!;
    expect(early).toMatch(/^Limb,/m);
    expect(early).not.toMatch(/# left out/);

    const waited = watch(linesChecked('active'));
    await settled();
    expect(waited.done).toBe(false);
    worker.answer();
    await settled();
    expect(waited.value).toBe(true);
    const d = useDocStore.getState().doc;
    const a = selectAnalysis(d);
    expect(a.leftOut.map((h) => h.name)).toEqual(['Limb']);
    expect(a.leftOut[0].reason).toMatch(/crosses itself between the pins \(segments \d+–\d+ and \d+–\d+ cross/);
    const csv = resultsCsv(d, a)!;
    expect(csv).not.toMatch(/^Limb,/m);
    expect(csv).toContain(`# left out,Limb — ${a.leftOut[0].reason}`);
    // The same words in the copied table, the figure and the section file for the command line (without the limb).
    expect(a.outcome?.ok && resultsTsv(a.outcome.analysis, 'Base', a.leftOut)).toContain(`Left out\tLimb — ${a.leftOut[0].reason}`);
    expect(renderSectionSvgParts({ doc: d, analysis: a, date: '2026-01-01' }).over).toContain('Left out of the analysis: Limb — ');
    const file = sectionFileText(a);
    expect(file.ok && JSON.parse(file.text)).toMatchObject({ leftOut: [{ name: 'Limb', reason: a.leftOut[0].reason }] });
    expect(file.ok && (JSON.parse(file.text) as { horizons: { name: string }[] }).horizons.map((h) => h.name)).toEqual(['H1', 'H2', 'H3', 'H4']);
    // The four horizons left are the forward model's line: D = 1000 m, detachment 3000 m below −500 m.
    expect(a.outcome?.ok && a.outcome.analysis.areaDepth?.detachmentDepth).toBeCloseTo(3000, 6);
    expect(useCrossingChecks.getState()).toMatchObject({ pending: 0, answered: 1 });
  });

  it('answers at once when nothing is pending, and a line that does not cross stays in', async () => {
    useDocStore.getState().replace(doc(limbLine(3000, false, shift)));
    const first = watch(linesChecked('active'));
    await settled();
    expect(first.done).toBe(false);
    worker.answer();
    await settled();
    expect(first.value).toBe(true);
    expect(await linesChecked('active')).toBe(true);
    expect(selectAnalysis(useDocStore.getState().doc).leftOut).toEqual([]);
    expect(worker.held).toHaveLength(0);
  });

  it('waits for a line edited during the wait as well', async () => {
    useDocStore.getState().replace(doc(limbLine(3000, false, shift)));
    const waited = watch(linesChecked('active'));
    await settled();
    // An edit meanwhile makes a new line (the pane analyses it at once, which hands it out).
    useDocStore.getState().apply((d) => moveVertex(d, 'limb', 1500, px(1250 + shift, -3000)));
    selectAnalysis(useDocStore.getState().doc);
    expect(useCrossingChecks.getState().pending).toBe(2);
    // The line before the edit answers first: the wait goes on for the edited one.
    worker.answer(1);
    await settled();
    expect(waited.done).toBe(false);
    expect(useCrossingChecks.getState().pending).toBe(1);
    worker.answer();
    await settled();
    expect(waited.value).toBe(true);
  });

  it('is cancelled by its signal, and says nothing was exported', async () => {
    useDocStore.getState().replace(doc(limbLine(3000, true, shift)));
    const gate = watch(afterLinesChecked('The SVG'));
    await settled();
    const session = useSessionStore.getState();
    expect(session.busy).toMatch(/^Checking lines… The SVG waits for the self-crossing check of the long lines\.$/);
    expect(session.busyCancel).not.toBeNull();
    session.busyCancel!();
    await settled();
    expect(gate.value).toBe(false);
    expect(useSessionStore.getState().busy).toBeNull();
    expect(useSessionStore.getState().message?.text).toMatch(/The SVG was cancelled while the lines were being checked; nothing was exported/);
  });

  it('tests the held lines here when the worker fails, so a wait always ends', async () => {
    useDocStore.getState().replace(doc(limbLine(3000, true, shift)));
    const waited = watch(linesChecked('active'));
    await settled();
    expect(waited.done).toBe(false);
    worker.onerror?.({} as ErrorEvent);
    await settled();
    expect(waited.value).toBe(true);
    expect(selectAnalysis(useDocStore.getState().doc).leftOut.map((h) => h.name)).toEqual(['Limb']);
  });
});

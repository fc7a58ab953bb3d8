// Long lines are tested for self-crossing in a worker (src/io/workers/selfCrossing.worker.ts), so that opening or
// editing a densely traced horizon does not hold the page: until the verdict comes back the line is measured as if
// it did not cross itself and the results strip says the check is running; when it comes back the analysis runs
// again with it (a line that crosses itself is then left out, with the reason, as everywhere else).
// Whatever leaves the page or runs on the numbers (exports, the report, copying the table, the Monte Carlo) waits
// for the pending checks first (linesChecked), so it never carries a line the pane will leave out a moment later.
import { create } from 'zustand';
import { recordCrossingVerdict, setCrossingDeferral } from '../core/geometry/crossingVerdicts';
import { sweepSelfCrossing } from '../core/geometry/sweepSelfCrossing';
import type { SelfCrossingReply, SelfCrossingRequest } from '../io/workers/selfCrossing.worker';
import { useDocStore } from './docStore';

/** Lines from this many vertices on are tested in the worker (shorter ones take well under a millisecond here). */
export const WORKER_CROSSING_VERTICES = 2000;

/** How many lines are being tested for self-crossing in the worker now, and how many verdicts have come back (views re-read the analysis when it changes). */
export const useCrossingChecks = create<{ pending: number; answered: number }>()(() => ({ pending: 0, answered: 0 }));

/** What the checks need of a worker (a real Worker, or a stand-in in tests). */
export interface CrossingWorker {
  postMessage(message: SelfCrossingRequest): void;
  onmessage: ((e: MessageEvent<SelfCrossingReply>) => void) | null;
  onerror: ((e: ErrorEvent) => void) | null;
  terminate(): void;
}

let worker: CrossingWorker | null = null;
// The lines handed out and not yet answered: if the worker fails they are tested here, so no one waits for ever.
const handedOut = new Map<string, SelfCrossingRequest>();

function answer(key: string, verdict: SelfCrossingReply['verdict']): void {
  if (!handedOut.delete(key)) return;
  recordCrossingVerdict(key, verdict);
  useCrossingChecks.setState((s) => ({ pending: handedOut.size, answered: s.answered + 1 }));
  // The document is unchanged but its analysis is not: selectAnalysis remembers results by crossingVerdictsVersion
  // as well as by the document, and the views that read it follow `answered`.
  useDocStore.setState({});
}

/** Starts handing long lines to the worker (once; does nothing where workers are unavailable, so lines are tested here). */
export function startCrossingChecks(makeWorker: () => CrossingWorker | null = defaultWorker): void {
  if (worker) return;
  worker = makeWorker();
  if (!worker) return;
  worker.onmessage = (e) => answer(e.data.key, e.data.verdict);
  worker.onerror = () => {
    // A worker that cannot run (or died) answers nothing: test what it held here, slower but never left hanging.
    worker?.terminate();
    worker = null;
    setCrossingDeferral(null);
    for (const [key, r] of [...handedOut]) answer(key, sweepSelfCrossing(r.xs, r.zs));
  };
  setCrossingDeferral((key, xs, zs) => {
    const request: SelfCrossingRequest = { key, xs, zs };
    handedOut.set(key, request);
    useCrossingChecks.setState({ pending: handedOut.size });
    // Copied, not transferred: the page keeps the line in case the worker fails.
    worker?.postMessage(request);
  }, WORKER_CROSSING_VERTICES);
}

function defaultWorker(): CrossingWorker | null {
  if (typeof Worker === 'undefined') return null;
  return new Worker(new URL('../io/workers/selfCrossing.worker.ts', import.meta.url), { type: 'module' }) as unknown as CrossingWorker;
}

/** Stops the checks and forgets what was handed out (tests; a page never stops them). */
export function stopCrossingChecks(): void {
  worker?.terminate();
  worker = null;
  handedOut.clear();
  setCrossingDeferral(null);
  useCrossingChecks.setState({ pending: 0 });
}

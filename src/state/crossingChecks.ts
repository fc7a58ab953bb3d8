// Long lines are tested for self-crossing in a worker (src/io/workers/selfCrossing.worker.ts), so that opening or
// editing a densely traced horizon does not hold the page: until the verdict comes back the line is measured as if
// it did not cross itself and the results strip says the check is running; when it comes back the analysis runs
// again with it (a line that crosses itself is then left out, with the reason, as everywhere else).
import { create } from 'zustand';
import { recordCrossingVerdict, setCrossingDeferral } from '../core/geometry/crossingVerdicts';
import type { SelfCrossingReply, SelfCrossingRequest } from '../io/workers/selfCrossing.worker';
import { useDocStore } from './docStore';

/** Lines from this many vertices on are tested in the worker (shorter ones take well under a millisecond here). */
export const WORKER_CROSSING_VERTICES = 2000;

/** How many lines are being tested for self-crossing in the worker now. */
export const useCrossingChecks = create<{ pending: number }>()(() => ({ pending: 0 }));

let worker: Worker | null = null;

/** Starts handing long lines to the worker (once; does nothing where workers are unavailable, so lines are tested here). */
export function startCrossingChecks(): void {
  if (worker || typeof Worker === 'undefined') return;
  worker = new Worker(new URL('../io/workers/selfCrossing.worker.ts', import.meta.url), { type: 'module' });
  worker.onmessage = (e: MessageEvent<SelfCrossingReply>) => {
    recordCrossingVerdict(e.data.key, e.data.verdict);
    useCrossingChecks.setState((s) => ({ pending: Math.max(0, s.pending - 1) }));
    // The document is unchanged but its analysis is not: a new state object makes every view read it again
    // (selectAnalysis remembers results by crossingVerdictsVersion as well as by the document).
    useDocStore.setState({});
  };
  setCrossingDeferral((key, xs, zs) => {
    const request: SelfCrossingRequest = { key, xs, zs };
    useCrossingChecks.setState((s) => ({ pending: s.pending + 1 }));
    worker?.postMessage(request, [xs.buffer, zs.buffer]);
  }, WORKER_CROSSING_VERTICES);
}

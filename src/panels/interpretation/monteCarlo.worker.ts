// Runs the engine's Monte Carlo off the page's thread, reporting progress; the panel cancels by
// terminating the worker.
import { monteCarlo } from '../../core/analysis/monteCarlo';
import type { MonteCarloReply, MonteCarloRequest } from './monteCarloMessages';

const post = (m: MonteCarloReply, transfer: Transferable[] = []) => (self as unknown as Worker).postMessage(m, transfer);

self.onmessage = (e: MessageEvent<MonteCarloRequest>) => {
  const { section, options } = e.data;
  try {
    const out = monteCarlo(section, options, (done, total) => post({ type: 'progress', done, total }));
    if (!out.ok) {
      post({ type: 'failed', message: out.problems.map((p) => p.message).join(' ') });
      return;
    }
    const r = out.result;
    const q = r.pointEstimate;
    post({
      type: 'done', runs: r.runs, valid: r.valid, failedShare: r.failedShare, depths: r.depths,
      depth: r.depth, elevation: r.elevation, displacement: r.displacement,
      pointDepth: q && !q.noDetachment ? q.detachmentDepth : null,
    }, [r.depths.buffer]);
  } catch (err) {
    post({ type: 'failed', message: `The Monte Carlo run stopped: ${String(err)}` });
  }
};

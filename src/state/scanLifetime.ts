// How long decoded scans live. A 100 MP scan holds about 0.4 GB as a bitmap (and a twelfth more as reduced tiles), so
// only the scan the open project shows stays decoded. A scan the undo history can bring back keeps its bytes
// (closed bitmap, no tiles) and is decoded again from them when it returns; any other scan is dropped.
// Releases wait until after the frame that shows the change (and the task that frame leaves for its end), so the
// scan layer has let go of the old tiles before they close, and closing a big scan never delays the picture of the
// one that replaces it.
import type { ProjectDoc } from '../core/model/projectDoc';
import { useDocStore, type DocState } from './docStore';
import { reopenSavedScan } from './projectActions';
import { getScan, putScan, retainScans } from './scanCache';

function scanIdsOf(docs: (ProjectDoc | null)[], into: Set<string>): void {
  for (const d of docs) if (d?.scan) into.add(d.scan.id);
}

/** Applies the lifetime rule to the store's state now: closes what is not shown, and decodes the shown scan again if it was released. */
export function retainScansFor(state: Pick<DocState, 'doc' | 'past' | 'future' | 'gestureStart'>): void {
  const shown = state.doc.scan;
  const keep = new Set<string>();
  scanIdsOf(state.past, keep);
  scanIdsOf(state.future, keep);
  scanIdsOf([state.gestureStart], keep);
  retainScans(shown?.id ?? null, keep);
  const cached = getScan(shown?.id);
  if (!shown || !cached?.released) return;
  void reopenSavedScan(cached.bytes, shown).then((r) => {
    // Still the scan shown, and still released: nothing newer took its place meanwhile.
    if (useDocStore.getState().doc.scan?.id !== shown.id || !getScan(shown.id)?.released) {
      if (r.ok) r.cached.bitmap?.close();
      return;
    }
    putScan(shown.id, r.ok ? r.cached : { bitmap: null, bytes: cached.bytes, notShown: r.message });
  });
}

/** Longest wait for the next frame (ms): a hidden tab draws none, and its closed scans still go. */
const FRAME_WAIT_MS = 500;

/** Calls `work` two tasks after the next frame (or after FRAME_WAIT_MS without one; two tasks later where there is no screen). */
function afterNextFrame(work: () => void): void {
  const twoTurns = () => setTimeout(() => setTimeout(work, 0), 0);
  if (typeof requestAnimationFrame === 'undefined') {
    twoTurns();
    return;
  }
  let started = false;
  const start = () => {
    if (started) return;
    started = true;
    clearTimeout(timer);
    twoTurns();
  };
  const timer = setTimeout(start, FRAME_WAIT_MS);
  requestAnimationFrame(start);
}

/** Starts applying the lifetime rule whenever the shown scan or the history changes; returns the stop function. */
export function startScanLifetime(): () => void {
  let pending = false;
  let stopped = false;
  const run = () => {
    pending = false;
    if (!stopped) retainScansFor(useDocStore.getState());
  };
  const unsubscribe = useDocStore.subscribe((s, prev) => {
    if (s.doc.scan === prev.doc.scan && s.past === prev.past && s.future === prev.future) return;
    if (pending) return;
    pending = true;
    afterNextFrame(run);
  });
  return () => {
    stopped = true;
    unsubscribe();
  };
}

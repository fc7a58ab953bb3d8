// The start of the next drag is prepared when the document settles, not on the drag's first move: preparing
// a big document (validating, clipping and measuring every line) takes more than a frame, and done on the
// first move it made every drag start with a stall. Preparation waits for a quiet moment after a change
// (the page's own work first) and is skipped while a gesture is under way (its start is already prepared).
import { useDocStore } from './docStore';
import { prepareForGesture } from './selectors';

/** Wait after the last document change before preparing, in milliseconds. */
const SETTLE_MS = 150;

/** Starts preparing each settled document for the next gesture; returns the stop function. */
export function startGesturePreparation(): () => void {
  let timer: ReturnType<typeof setTimeout> | undefined;
  const prepare = () => {
    timer = undefined;
    const { doc, gestureStart } = useDocStore.getState();
    if (!gestureStart) prepareForGesture(doc);
  };
  const schedule = () => {
    clearTimeout(timer);
    timer = setTimeout(prepare, SETTLE_MS);
  };
  schedule();
  const unsubscribe = useDocStore.subscribe((s, prev) => {
    if (s.doc !== prev.doc || s.gestureStart !== prev.gestureStart) schedule();
  });
  return () => {
    unsubscribe();
    clearTimeout(timer);
  };
}

// Whatever leaves the page or runs on the numbers (the figure, the report, the results table and section file, the
// copied table, the Monte Carlo) waits until every long line it uses has its self-crossing verdict (crossingChecks.ts),
// then reads the analysis again: a line found to cross itself is then left out, with the reason, exactly as the pane
// shows it. The wait says so ("Checking lines…"), can be cancelled, and follows edits made meanwhile.
import { useCrossingChecks } from './crossingChecks';
import { useDocStore } from './docStore';
import { selectAnalysis } from './selectors';
import { useSessionStore } from './sessionStore';

/** Which scenarios' numbers are used: the active one, or every one (the report compares them). */
export type CheckScope = 'active' | 'all';

/** Analyses the current document over the scope (which hands any unchecked long line to the worker) and returns how many checks are pending. */
export function pendingLineChecks(scope: CheckScope): number {
  const doc = useDocStore.getState().doc;
  const ids = scope === 'all' ? doc.scenarios.map((s) => s.id) : [doc.activeScenarioId];
  for (const id of ids) selectAnalysis(doc, id);
  return useCrossingChecks.getState().pending;
}

/** Resolves true once no check is pending for the document as it is then (lines edited meanwhile are waited for too), false if `signal` aborts first. */
export function linesChecked(scope: CheckScope, signal?: AbortSignal): Promise<boolean> {
  return new Promise((resolve) => {
    let finished = false;
    let scheduled = false;
    let unsubscribe = () => {};
    const finish = (answered: boolean) => {
      if (finished) return;
      finished = true;
      unsubscribe();
      signal?.removeEventListener('abort', onAbort);
      resolve(answered);
    };
    const onAbort = () => finish(false);
    const look = () => {
      scheduled = false;
      if (!finished && pendingLineChecks(scope) === 0) finish(true);
    };
    if (signal?.aborted) return finish(false);
    signal?.addEventListener('abort', onAbort);
    // Looked at a microtask later: the count also changes while an analysis is running (a line handed out), and
    // analysing again from inside that would start the same analysis twice.
    unsubscribe = useCrossingChecks.subscribe(() => {
      if (scheduled || finished) return;
      scheduled = true;
      queueMicrotask(look);
    });
    look();
  });
}

/**
 * Runs before an export or a run on the numbers: true at once when no check is pending; otherwise shows
 * "Checking lines…" with a Cancel in the busy bar until they answer (true), or says nothing was done when
 * cancelled (false). `what` names the work in the messages ("The SVG").
 */
export async function afterLinesChecked(what: string, scope: CheckScope = 'active'): Promise<boolean> {
  if (pendingLineChecks(scope) === 0) return true;
  const session = useSessionStore.getState();
  const controller = new AbortController();
  // No count: a line dragged is checked at several of its shapes, which would read as several lines.
  session.setBusy(`Checking lines… ${what} waits for the self-crossing check of the long lines.`, { cancel: () => controller.abort() });
  const answered = await linesChecked(scope, controller.signal);
  session.setBusy(null);
  if (!answered) session.showMessage('info', `${what} was cancelled while the lines were being checked; nothing was exported or run.`);
  return answered;
}

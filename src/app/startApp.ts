// What happens once when the page opens: the last kept work comes back if there is any worth
// restoring; otherwise the demo section opens, ready to explore. Autosave starts after either,
// so that the restore itself is not mistaken for new work.
import { openDemo } from '../state/openDemo';
import { autosaveNow, followKeptWork, restoreAutosave, startAutosave } from '../state/autosave';
import { claimEditing } from '../state/tabLock';
import { startGesturePreparation } from '../state/gesturePreparation';
import { useSessionStore } from '../state/sessionStore';
import { useAutosaveStatus } from '../state/autosaveStatus';
import { startScanLifetime } from '../state/scanLifetime';
import { startCrossingChecks } from '../state/crossingChecks';
import { startOpeningWorker } from '../io/readProjectFile';

let started = false;

/** Runs the start-up sequence once per page load (safe under React's double effects). */
export function startApp(): void {
  if (started) return;
  started = true;
  startScanLifetime();
  // Long lines are tested for self-crossing in a worker, so the page is not held while they are.
  startCrossingChecks();
  void (async () => {
    // Another tab editing the kept work: this one shows it read-only, following what that tab keeps (and can take
    // over, or takes over on its own when that tab closes, reading what it kept first), and never writes over it.
    // On taking over, the work comes from the other tab, not from a last session: no "brought back" banner (nor its
    // "Start fresh", which would clear that work).
    await claimEditing(autosaveNow, followKeptWork, async () => {
      await restoreAutosave();
      useAutosaveStatus.setState({ restoredFrom: null });
    });
    const restored = await restoreAutosave();
    if (!restored) await openDemo();
    startAutosave();
    startGesturePreparation();
    useSessionStore.getState().setStarted();
    // The worker that opens project and section files starts while the page is idle, not when a file is chosen.
    startOpeningWorker();
  })();
}

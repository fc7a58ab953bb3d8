// The page's one keyboard listener: each key press is looked up in the key table (state/keyTable.ts) and
// carried out by the handler of its action here. Whose key it is — a field being typed in, a focused
// button, an open dialog — is decided once, by the row's `when`.
import { useEffect } from 'react';
import { cancelTool, dispatchToolEvent, redoInTool, toolMidGesture, toolViewElement, undoInTool } from '../canvas/toolDispatch';
import { isTyping, keyForTools } from '../canvas/keyForTools';
import { zoomByStep, zoomToActualSize, zoomToFit } from '../panels/ScanControls';
import { useDocStore } from '../state/docStore';
import { KEY_TABLE, pressesChord, type KeyAction, type KeyChord, type KeyRow, type KeyWhen } from '../state/keyTable';
import { useScanChoiceStore } from '../state/scanChoiceStore';
import { useSessionStore } from '../state/sessionStore';
import { useToolSession } from '../state/toolSessionStore';

const PAN_STEP_PX = 80;
const ZOOM_STEP = 1.25;

function pan(dx: number, dy: number): void {
  const { camera, setCamera } = useSessionStore.getState();
  setCamera({ ...camera, x: camera.x + dx, y: camera.y + dy });
}

/** What each action does. Esc is left to the browser as well (it ends a drag-and-drop, stops loading). */
const ACTIONS: Record<KeyAction, (e: KeyboardEvent, row: KeyRow) => void> = {
  undo: () => {
    // While a line is being drawn by anchors, undo takes back its last stretch and redo puts it back.
    if (!undoInTool()) useDocStore.getState().undo();
  },
  redo: () => {
    if (!redoInTool()) useDocStore.getState().redo();
  },
  zoomIn: () => zoomByStep(ZOOM_STEP),
  zoomOut: () => zoomByStep(1 / ZOOM_STEP),
  zoomToFit: () => zoomToFit(),
  actualSize: () => zoomToActualSize(),
  panLeft: () => pan(PAN_STEP_PX, 0),
  panRight: () => pan(-PAN_STEP_PX, 0),
  panUp: () => pan(0, PAN_STEP_PX),
  panDown: () => pan(0, -PAN_STEP_PX),
  holdToPan: () => useToolSession.getState().setSpaceHeld(true),
  finishLine: () => dispatchToolEvent({ type: 'key', key: 'Enter' }),
  removeLast: (e) => dispatchToolEvent({ type: 'key', key: e.key }),
  cancel: () => {
    cancelTool();
    useToolSession.getState().setHelpOpen(false);
  },
  toggleHelp: () => useToolSession.getState().setHelpOpen(!useToolSession.getState().helpOpen),
  chooseTool: (_e, row) => {
    if (row.toolId) useSessionStore.getState().setTool(row.toolId);
  },
  cancelPageDialog: () => useScanChoiceStore.getState().answer(null),
};

/** True when a modal dialog is on the page: the page's own keys wait until it closes. */
function dialogOpen(): boolean {
  return document.querySelector('[aria-modal="true"]') !== null;
}

/** Returns true when a row with this `when` applies to a key pressed with focus on `target`. */
function applies(when: KeyWhen, target: EventTarget | null): boolean {
  if (when === 'pageDialog') return useScanChoiceStore.getState().request !== null;
  if (isTyping(target) || dialogOpen()) return false;
  if (when === 'page') return true;
  return keyForTools(target, toolViewElement(), useToolSession.getState().panning || toolMidGesture());
}

/** Returns the first row and key of the table that `e` presses and that applies now, or null. */
export function findKey(e: KeyboardEvent): { row: KeyRow; chord: KeyChord } | null {
  for (const row of KEY_TABLE) {
    const chord = row.chords.find((c) => pressesChord(e, c));
    if (chord && applies(row.when, e.target)) return { row, chord };
  }
  return null;
}

/** Installs the page's keyboard listener (and the release of Space, which ends holding to pan). */
export function useKeys(): void {
  useEffect(() => {
    const down = (e: KeyboardEvent) => {
      const found = findKey(e);
      if (!found) return;
      if (found.chord.key !== 'Escape') e.preventDefault();
      ACTIONS[found.chord.action](e, found.row);
    };
    const up = (e: KeyboardEvent) => {
      if (e.key === ' ') useToolSession.getState().setSpaceHeld(false);
    };
    window.addEventListener('keydown', down);
    window.addEventListener('keyup', up);
    return () => {
      window.removeEventListener('keydown', down);
      window.removeEventListener('keyup', up);
    };
  }, []);
}

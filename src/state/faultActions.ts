// Fault edits on the document store: each is one pure command from core/model/commands applied as one undo
// step (a drag of a fault vertex uses the store's gesture instead: beginGesture, apply(moveFaultVertex…),
// endGesture). Refusals and consequences are said in words through the session's message.
import { addFault, nextFaultId } from '../core/model/commands/addFault';
import { addJoin } from '../core/model/commands/addJoin';
import { deleteFault, horizonsJoinedOn } from '../core/model/commands/deleteFault';
import { moveFaultVertex } from '../core/model/commands/moveFaultVertex';
import { removeJoin } from '../core/model/commands/removeJoin';
import { renameFault } from '../core/model/commands/renameFault';
import { setFaultPoints } from '../core/model/commands/setFaultPoints';
import { setFaultStyle, type FaultStyle } from '../core/model/commands/setFaultStyle';
import type { DocFault, ImagePx, ProjectDoc } from '../core/model/projectDoc';
import { useDocStore } from './docStore';
import { useSessionStore } from './sessionStore';

const apply = (command: (d: ProjectDoc) => ProjectDoc) => useDocStore.getState().apply(command);
const doc = () => useDocStore.getState().doc;

/** Adds a fault (one undo step) and returns its id. */
export function addFaultAction(pointsPx: ImagePx[], options: Partial<Omit<DocFault, 'pointsPx' | 'id'>> = {}): string {
  const id = nextFaultId(doc());
  apply((d) => addFault(d, { ...options, id, pointsPx }));
  return id;
}

/** Replaces the fault's vertices (one undo step). */
export function setFaultPointsAction(faultId: string, pointsPx: ImagePx[]): void {
  apply((d) => setFaultPoints(d, faultId, pointsPx));
}

/** Moves one vertex of the fault, carrying the cutoffs on it (one undo step). */
export function moveFaultVertexAction(faultId: string, i: number, p: ImagePx): void {
  apply((d) => moveFaultVertex(d, faultId, i, p));
}

/** Renames the fault (one undo step); returns false and says why when the name is blank or another fault has it. */
export function renameFaultAction(faultId: string, name: string): boolean {
  const before = doc();
  apply((d) => renameFault(d, faultId, name));
  const f = doc().faults.find((x) => x.id === faultId);
  if (doc() !== before || f?.name === name.trim()) return true;
  useSessionStore.getState().showMessage('error', name.trim() === '' ? 'A fault needs a name.' : `Another fault is already called "${name.trim()}"; choose another name.`);
  return false;
}

/** Sets the fault's colour, visibility or lock (one undo step). */
export function setFaultStyleAction(faultId: string, style: FaultStyle): void {
  apply((d) => setFaultStyle(d, faultId, style));
}

/**
 * Deletes the fault (one undo step). Horizons joined on it are not deleted with it: their pieces either side
 * become one line, and the message names them and says that undo brings the fault and the joins back.
 */
export function deleteFaultAction(faultId: string): string | null {
  const d = doc();
  const fault = d.faults.find((f) => f.id === faultId);
  if (!fault) return null;
  const users = horizonsJoinedOn(d, faultId).map((h) => `"${h.name}"`);
  apply((x) => deleteFault(x, faultId));
  const text = users.length === 0
    ? `Fault "${fault.name}" deleted.`
    : `Fault "${fault.name}" deleted. ${users.length === 1 ? 'Horizon' : 'Horizons'} ${users.join(', ')} ${users.length === 1 ? 'was' : 'were'} joined on it and ${users.length === 1 ? 'is' : 'are'} now one line across it, the cutoffs joined straight; undo (Ctrl+Z) brings the fault and the joins back.`;
  useSessionStore.getState().showMessage('info', text);
  return text;
}

/** Cuts the horizon at vertex `at` by the fault (one undo step; `snap` moves the two piece ends onto the fault); false when it cannot. */
export function addJoinAction(horizonId: string, at: number, faultId: string, snap = false): boolean {
  const before = doc();
  apply((d) => addJoin(d, horizonId, at, faultId, snap));
  return doc() !== before;
}

/** Removes the horizon's cut at vertex `at` (one undo step). */
export function removeJoinAction(horizonId: string, at: number): void {
  apply((d) => removeJoin(d, horizonId, at));
}

// The store has no "replaced" event; a replace is the one change that leaves a new document with no
// undo history and marked saved (docStore.replace), which no edit, gesture, undo or redo does.
import type { DocState } from '../../state/docStore';

/** Returns true when the change from `prev` to `s` is a replace (Project ▸ New, opening a file, restoring). */
export function isDocReplaced(s: DocState, prev: DocState): boolean {
  return s.doc !== prev.doc && s.past.length === 0 && s.future.length === 0 && s.gestureStart === null && s.savedRevision === s.revision;
}

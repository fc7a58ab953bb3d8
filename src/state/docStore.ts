// The document slice: the saved, undoable project, with one undo entry per gesture.
// Every edit is a pure command (doc -> doc) from src/core; this store only applies them.
import { create } from 'zustand';
import { addedOverLimit } from '../core/model/addedOverLimit';
import { emptyProjectDoc, type ProjectDoc } from '../core/model/projectDoc';
import { useSessionStore } from './sessionStore';

export type DocCommand = (doc: ProjectDoc) => ProjectDoc;

const HISTORY_LIMIT = 500;
const NO_REGIONALS: readonly string[] = [];

export interface DocState {
  doc: ProjectDoc;
  past: ProjectDoc[];
  future: ProjectDoc[];
  /** The document at the start of the gesture in progress, or null. */
  gestureStart: ProjectDoc | null;
  /** Bumped whenever the document changes (autosave and dirty tracking listen to it). */
  revision: number;
  /** The revision when the gesture in progress began (see shownRevision). */
  gestureRevision: number;
  /**
   * The horizons whose regionals the gesture in progress moves, as known when it began (empty when it moves none, or
   * outside a gesture): the section view sets their fills apart on the press rather than on the first move.
   */
  gestureRegionals: readonly string[];
  /** Revision of the last save or open, to warn before closing with unsaved changes. */
  savedRevision: number;
  /** True while another tab edits the kept work (set by tabLock.ts): this one only shows it, and edits do nothing. */
  readOnly: boolean;
  /** Bumped by every replace (new, open, restore): what the session derived for one project means nothing for the next. */
  opened: number;
  /** Applies the command; false when nothing changed (read-only, the same document, or an addition over a limit, refused with a message). */
  apply: (command: DocCommand) => boolean;
  /** Starts a gesture (one undo entry); `regionals` names the horizons whose regionals it will move, if known. */
  beginGesture: (regionals?: readonly string[]) => void;
  endGesture: () => void;
  cancelGesture: () => void;
  undo: () => void;
  redo: () => void;
  /** Replaces the document (open, new, restore) and clears the history. */
  replace: (doc: ProjectDoc) => void;
  markSaved: () => void;
}

export const useDocStore = create<DocState>()((set, get) => ({
  doc: emptyProjectDoc(),
  past: [],
  future: [],
  gestureStart: null,
  readOnly: false,
  revision: 0,
  gestureRevision: 0,
  gestureRegionals: [],
  savedRevision: 0,
  opened: 0,
  apply: (command) => {
    if (get().readOnly) return false;
    const { doc, past, gestureStart, revision } = get();
    const next = command(doc);
    if (next === doc) return false;
    // Every way of making a horizon, fault or scenario passes here: one beyond its limit is refused where it is made.
    const over = addedOverLimit(doc, next);
    if (over) {
      useSessionStore.getState().showMessage('error', over);
      return false;
    }
    if (gestureStart) set({ doc: next, revision: revision + 1 });
    else set({ doc: next, past: [...past, doc].slice(-HISTORY_LIMIT), future: [], revision: revision + 1 });
    return true;
  },
  beginGesture: (regionals = NO_REGIONALS) => {
    if (!get().gestureStart && !get().readOnly) set({ gestureStart: get().doc, gestureRevision: get().revision, gestureRegionals: regionals });
  },
  endGesture: () => {
    const { gestureStart, doc, past } = get();
    if (!gestureStart) return;
    if (gestureStart === doc) set({ gestureStart: null, gestureRegionals: NO_REGIONALS });
    else set({ gestureStart: null, gestureRegionals: NO_REGIONALS, past: [...past, gestureStart].slice(-HISTORY_LIMIT), future: [] });
  },
  cancelGesture: () => {
    const { gestureStart, revision } = get();
    if (gestureStart) set({ doc: gestureStart, gestureStart: null, gestureRegionals: NO_REGIONALS, revision: revision + 1 });
  },
  undo: () => {
    const { past, doc, future, gestureStart, revision } = get();
    if (gestureStart || past.length === 0 || get().readOnly) return;
    set({ doc: past[past.length - 1], past: past.slice(0, -1), future: [doc, ...future], revision: revision + 1 });
  },
  redo: () => {
    const { past, doc, future, gestureStart, revision } = get();
    if (gestureStart || future.length === 0 || get().readOnly) return;
    set({ doc: future[0], past: [...past, doc], future: future.slice(1), revision: revision + 1 });
  },
  replace: (doc) => {
    const revision = get().revision + 1;
    set({ doc, past: [], future: [], gestureStart: null, gestureRegionals: NO_REGIONALS, revision, savedRevision: revision, opened: get().opened + 1 });
  },
  markSaved: () => set({ savedRevision: get().revision }),
}));

/**
 * The revision the status line speaks of: during a gesture, the one it began at. "Unsaved changes" and "kept in
 * browser" then turn when the gesture ends (autosave waits for it too) instead of on its first move, where
 * re-rendering the menu bar and laying out its text cost the frame that has to show the move.
 */
export function shownRevision(s: Pick<DocState, 'gestureStart' | 'revision' | 'gestureRevision'>): number {
  return s.gestureStart ? s.gestureRevision : s.revision;
}

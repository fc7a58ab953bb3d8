// Every key of the page, once: which key with which modifiers, what it does, as written for the user, and
// when it applies. The app's one keyboard listener (app/useKeys.ts) dispatches from this table, the help
// overlay (panels/workspace/HelpOverlay.tsx) lists it, and README's "Keys" table is checked against it
// (tests/docs/keysAgree.test.tsx). Rows without a key are pointer gestures, listed for the user only; the
// section view handles them.
import { TOOLS } from '../tools/toolRegistry';

/**
 * A key as KeyboardEvent.key spells it (compared without case: Caps Lock does not change it), with its
 * modifiers: `mod` is Ctrl or Cmd and must match; `shift` and `alt` must match when given and are free when
 * not (a `?` or `+` needs Shift on many layouts).
 */
export interface KeyChord {
  key: string;
  mod: boolean;
  shift?: boolean;
  alt?: boolean;
  /** What this key does. */
  action: KeyAction;
}

/**
 * When a key applies. `page`: anywhere, except while typing in a field or while a dialog is open. `view`:
 * as `page`, and only when the section view's tools have the keyboard (keyForTools: a focused button keeps
 * its own Enter and Space). `pageDialog`: while the dialog asking which page of a PDF or TIFF to open is
 * shown, even while typing in it.
 */
export type KeyWhen = 'page' | 'view' | 'pageDialog';

/** What a key does; app/useKeys.ts holds one handler for each. */
export type KeyAction =
  | 'undo' | 'redo' | 'zoomIn' | 'zoomOut' | 'zoomToFit' | 'actualSize'
  | 'panLeft' | 'panRight' | 'panUp' | 'panDown' | 'holdToPan'
  | 'finishLine' | 'removeLast' | 'cancel' | 'toggleHelp' | 'chooseTool' | 'cancelPageDialog';

export interface KeyRow {
  /** The key as written for the user (README and the help overlay). */
  label: string;
  /** What it does, in plain words. */
  what: string;
  /** The keys that do it; empty for a pointer gesture (wheel, drag, click), which the section view handles. */
  chords: readonly KeyChord[];
  when: KeyWhen;
  /** The tool a `chooseTool` row chooses. */
  toolId?: string;
  /** The row's tool, for the help overlay's tool table. */
  toolLabel?: string;
}

const key = (k: string, action: KeyAction, more: Partial<KeyChord> = {}): KeyChord => ({ key: k, mod: false, action, ...more });

/** Each tool's key, from the tool registry (no modifier: Shift or Alt with a letter means something else). */
const TOOL_ROWS: readonly KeyRow[] = TOOLS.map((t) => ({
  label: t.key.toUpperCase(),
  what: t.hint,
  chords: [key(t.key, 'chooseTool', { shift: false, alt: false })],
  when: 'page',
  toolId: t.tool.id,
  toolLabel: t.label,
}));

const GENERAL_ROWS: readonly KeyRow[] = [
  { label: 'Ctrl/Cmd + Z', what: 'Undo (a drawn line steps back one stretch at a time, while drawing and after)', chords: [key('z', 'undo', { mod: true, shift: false })], when: 'page' },
  { label: 'Shift + Ctrl/Cmd + Z, Ctrl/Cmd + Y', what: 'Redo (while drawing a line: put back the stretch undo took)', chords: [key('z', 'redo', { mod: true, shift: true }), key('y', 'redo', { mod: true })], when: 'page' },
  { label: 'Wheel', what: 'Zoom about the cursor', chords: [], when: 'page' },
  { label: '+ / −', what: 'Zoom in / out', chords: [key('+', 'zoomIn'), key('=', 'zoomIn'), key('-', 'zoomOut')], when: 'page' },
  { label: 'F', what: 'Zoom to fit', chords: [key('f', 'zoomToFit')], when: 'page' },
  { label: '1', what: 'Actual size: one scan pixel per screen pixel', chords: [key('1', 'actualSize', { alt: false })], when: 'page' },
  { label: 'Space + drag, middle drag', what: 'Pan (Space on a focused button presses the button)', chords: [key(' ', 'holdToPan')], when: 'view' },
  { label: 'Arrow keys', what: 'Pan', chords: [key('ArrowLeft', 'panLeft'), key('ArrowRight', 'panRight'), key('ArrowUp', 'panUp'), key('ArrowDown', 'panDown')], when: 'page' },
  { label: 'Enter / double-click', what: 'Finish the line being drawn (Enter on a focused button presses the button)', chords: [key('Enter', 'finishLine')], when: 'view' },
  { label: 'Backspace / Delete', what: 'Remove the last point drawn (and the stretch traced to it); in Edit, delete the chosen vertex', chords: [key('Backspace', 'removeLast'), key('Delete', 'removeLast')], when: 'page' },
  { label: 'Esc', what: 'Cancel what the tool is doing; close this list', chords: [key('Escape', 'cancel')], when: 'page' },
  { label: 'Esc', what: 'In the dialog choosing a PDF or TIFF page: close it without opening', chords: [key('Escape', 'cancelPageDialog')], when: 'pageDialog' },
  { label: 'Shift + drag', what: 'Edit: move a whole line · Regional: move every regional', chords: [], when: 'page' },
  { label: 'Alt + click', what: 'Draw horizon, Fault: a straight stretch (or a followed one, with following off) · Calibrate: no snapping · Edit: delete a vertex', chords: [], when: 'page' },
  { label: '?', what: 'Show or hide this list', chords: [key('?', 'toggleHelp')], when: 'page' },
];

/** Every key of the page: the tools' keys, then the rest. */
export const KEY_TABLE: readonly KeyRow[] = [...TOOL_ROWS, ...GENERAL_ROWS];

/** Returns true when `e` presses `c` (modifiers as KeyChord says). */
export function pressesChord(e: Pick<KeyboardEvent, 'key' | 'ctrlKey' | 'metaKey' | 'shiftKey' | 'altKey'>, c: KeyChord): boolean {
  if (e.key.toLowerCase() !== c.key.toLowerCase()) return false;
  if ((e.ctrlKey || e.metaKey) !== c.mod) return false;
  if (c.shift !== undefined && e.shiftKey !== c.shift) return false;
  return c.alt === undefined || e.altKey === c.alt;
}

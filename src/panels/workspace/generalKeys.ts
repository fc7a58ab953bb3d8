// The keys that are not a tool's own key, as the help overlay lists them. README's "Keys" table lists the
// same keys (tests/docs/keysAgree.test.ts), so the two cannot drift apart; a tool's key lives in
// src/tools/toolRegistry.ts.

/** [key as written for the user, what it does]. */
export const GENERAL_KEYS: readonly (readonly [string, string])[] = [
  ['Ctrl/Cmd + Z', 'Undo (a drawn line steps back one stretch at a time, while drawing and after)'],
  ['Shift + Ctrl/Cmd + Z, Ctrl/Cmd + Y', 'Redo (while drawing a line: put back the stretch undo took)'],
  ['Wheel', 'Zoom about the cursor'],
  ['+ / −', 'Zoom in / out'],
  ['F', 'Zoom to fit'],
  ['1', 'Actual size: one scan pixel per screen pixel'],
  ['Space + drag, middle drag', 'Pan (Space on a focused button presses the button)'],
  ['Arrow keys', 'Pan'],
  ['Enter / double-click', 'Finish the line being drawn (Enter on a focused button presses the button)'],
  ['Backspace', 'Remove the last point drawn (and the stretch traced to it); in Edit, delete the chosen vertex'],
  ['Esc', 'Cancel what the tool is doing'],
  ['Shift + drag', 'Edit: move a whole line · Regional: move every regional'],
  ['Alt + click', 'Draw horizon, Fault: a straight stretch (or a followed one, with following off) · Calibrate: no snapping · Edit: delete a vertex'],
  ['?', 'Show or hide this list'],
];

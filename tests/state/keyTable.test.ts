import { describe, expect, it } from 'vitest';
import { KEY_TABLE, pressesChord, type KeyChord } from '../../src/state/keyTable';
import { TOOLS } from '../../src/tools/toolRegistry';

// The one key table: each key press means at most one thing at a time, every tool has its key, and the
// modifiers are read as the help says (common practice for browser shortcuts: Ctrl on Windows and Linux,
// Cmd on macOS; Shift is part of the character for `?` and `+`).

type Press = { key: string; ctrlKey?: boolean; metaKey?: boolean; shiftKey?: boolean; altKey?: boolean };
const ev = (p: Press) => ({ ctrlKey: false, metaKey: false, shiftKey: false, altKey: false, ...p });

/** The actions of every row (with `when`) that `p` presses. */
function actionsFor(p: Press): string[] {
  return KEY_TABLE.flatMap((r) => r.chords.filter((c) => pressesChord(ev(p), c)).map((c) => `${r.when}:${c.action}`));
}

/** Representative presses of a chord: each free modifier both ways. */
function pressesOf(c: KeyChord): Press[] {
  const out: Press[] = [];
  for (const shiftKey of c.shift === undefined ? [false, true] : [c.shift]) {
    for (const altKey of c.alt === undefined ? [false, true] : [c.alt]) out.push({ key: c.key, ctrlKey: c.mod, shiftKey, altKey });
  }
  return out;
}

describe('the key table', () => {
  it('no press means two things in the same place', () => {
    for (const row of KEY_TABLE) {
      for (const c of row.chords) {
        for (const p of pressesOf(c)) {
          const found = actionsFor(p).filter((a) => a.startsWith(`${row.when}:`));
          expect(found, JSON.stringify(p)).toEqual([`${row.when}:${c.action}`]);
        }
      }
    }
  });

  it('every tool has one row, choosing it by its registry key', () => {
    for (const t of TOOLS) {
      const rows = KEY_TABLE.filter((r) => r.toolId === t.tool.id);
      expect(rows).toHaveLength(1);
      expect(actionsFor({ key: t.key })).toEqual(['page:chooseTool']);
      // Caps Lock gives the capital letter: still the tool; Shift or Alt with it is not.
      expect(actionsFor({ key: t.key.toUpperCase() })).toEqual(['page:chooseTool']);
      expect(actionsFor({ key: t.key.toUpperCase(), shiftKey: true })).toEqual([]);
      expect(actionsFor({ key: t.key, altKey: true })).toEqual([]);
    }
  });

  it('reads Ctrl/Cmd and Shift as the help writes them', () => {
    expect(actionsFor({ key: 'z', ctrlKey: true })).toEqual(['page:undo']);
    expect(actionsFor({ key: 'z', metaKey: true })).toEqual(['page:undo']);
    expect(actionsFor({ key: 'Z', ctrlKey: true, shiftKey: true })).toEqual(['page:redo']);
    expect(actionsFor({ key: 'y', ctrlKey: true })).toEqual(['page:redo']);
    expect(actionsFor({ key: 'z' })).toEqual([]);
    expect(actionsFor({ key: '?', shiftKey: true })).toEqual(['page:toggleHelp']);
    expect(actionsFor({ key: '+', shiftKey: true })).toEqual(['page:zoomIn']);
    expect(actionsFor({ key: '1' })).toEqual(['page:actualSize']);
    expect(actionsFor({ key: '1', ctrlKey: true })).toEqual([]);
    expect(actionsFor({ key: 'Escape' })).toEqual(['page:cancel', 'pageDialog:cancelPageDialog']);
    expect(actionsFor({ key: 'Delete' })).toEqual(['page:removeLast']);
  });

  it('every row is described, and only pointer gestures have no key', () => {
    for (const r of KEY_TABLE) {
      expect(r.label.length).toBeGreaterThan(0);
      expect(r.what.length).toBeGreaterThan(0);
      if (r.chords.length === 0) expect(r.label).toMatch(/wheel|drag|click/i);
    }
  });
});

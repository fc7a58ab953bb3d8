// After Project ▸ New or opening a file the workspace returns to the Select tool; it
// recognises the replace from the store's change alone, and must not mistake an edit, gesture or undo for one.
import { beforeEach, describe, expect, it } from 'vitest';
import { emptyProjectDoc } from '../../../src/core/model/projectDoc';
import { setUnits } from '../../../src/core/model/commands/setUnits';
import { setSettings } from '../../../src/core/model/commands/setSettings';
import { useDocStore, type DocState } from '../../../src/state/docStore';
import { isDocReplaced } from '../../../src/panels/workspace/isDocReplaced';

/** Runs `change` on the store and returns whether isDocReplaced saw a replace. */
function sawReplace(change: () => void): boolean {
  let seen = false;
  const off = useDocStore.subscribe((s: DocState, prev: DocState) => {
    if (isDocReplaced(s, prev)) seen = true;
  });
  change();
  off();
  return seen;
}

describe('isDocReplaced(state, prev)', () => {
  beforeEach(() => useDocStore.getState().replace(emptyProjectDoc()));

  it('is true for replace (new, open, restore)', () => {
    expect(sawReplace(() => useDocStore.getState().replace(emptyProjectDoc()))).toBe(true);
  });

  it('is false for an edit, a gesture, its cancel, undo, redo and a save mark', () => {
    const store = () => useDocStore.getState();
    expect(sawReplace(() => store().apply((d) => setUnits(d, 'ft')))).toBe(false);
    expect(sawReplace(() => store().undo())).toBe(false);
    expect(sawReplace(() => store().redo())).toBe(false);
    expect(sawReplace(() => store().markSaved())).toBe(false);
    store().replace(emptyProjectDoc());
    expect(sawReplace(() => {
      store().beginGesture();
      store().apply((d) => setSettings(d, { showFills: !d.settings.showFills }));
    })).toBe(false);
    expect(sawReplace(() => store().cancelGesture())).toBe(false);
  });
});

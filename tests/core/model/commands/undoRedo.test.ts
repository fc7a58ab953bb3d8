// Through the document store: undo(redo(x)) is x, one undo entry per gesture, cancel reverts to the
// gesture's start, and every command's document survives a JSON round trip unchanged (plain data).
import { beforeEach, describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { insertVertex } from '../../../../src/core/model/commands/insertVertex';
import { moveHorizon } from '../../../../src/core/model/commands/moveHorizon';
import { moveVertex } from '../../../../src/core/model/commands/moveVertex';
import { offsetRegionals } from '../../../../src/core/model/commands/offsetRegionals';
import { parallelRegionals } from '../../../../src/core/model/commands/parallelRegionals';
import { proposeRegional } from '../../../../src/core/model/commands/proposeRegional';
import { renameHorizon } from '../../../../src/core/model/commands/renameHorizon';
import { reorderHorizons } from '../../../../src/core/model/commands/reorderHorizons';
import { setProjected } from '../../../../src/core/model/commands/setProjected';
import { setRegional } from '../../../../src/core/model/commands/setRegional';
import type { ProjectDoc } from '../../../../src/core/model/projectDoc';
import { useDocStore } from '../../../../src/state/docStore';
import { fixtureDoc } from './docFixture';

const commands: ((d: ProjectDoc) => ProjectDoc)[] = [
  (d) => moveVertex(d, 'h1', 2, [505, 35]),
  (d) => insertVertex(d, 'h2', 1, [100, 205]),
  (d) => moveHorizon(d, 'h2', [3, 4]),
  (d) => setProjected(d, 'h2', [0, 2], true),
  (d) => renameHorizon(d, 'h1', 'Top'),
  (d) => reorderHorizons(d, 1, 0),
  (d) => setRegional(d, 'h1', [[0, 99], [1000, 101]]),
  (d) => proposeRegional(d, 'h2'),
  (d) => parallelRegionals(setRegional(d, 'h1', [[0, 99], [1000, 101]]), 'h1'),
  (d) => offsetRegionals(setRegional(d, 'h1', [[0, 99], [1000, 101]]), null, 25),
];

describe('edits through the document store', () => {
  beforeEach(() => useDocStore.getState().replace(fixtureDoc()));

  it('undo(redo(x)) is x and redo(undo(x)) is x for any sequence of commands (fast-check)', () => {
    fc.assert(fc.property(fc.array(fc.integer({ min: 0, max: commands.length - 1 }), { minLength: 1, maxLength: 8 }), (picks) => {
      const store = useDocStore.getState();
      store.replace(fixtureDoc());
      const states = [useDocStore.getState().doc];
      for (const k of picks) {
        useDocStore.getState().apply(commands[k]);
        // A command that changes nothing returns the same document and records no entry.
        const doc = useDocStore.getState().doc;
        if (doc !== states[states.length - 1]) states.push(doc);
      }
      const entries = useDocStore.getState().past.length;
      expect(entries).toBe(states.length - 1);
      for (let i = 0; i < entries; i++) useDocStore.getState().undo();
      expect(useDocStore.getState().doc).toBe(states[0]);
      for (let i = 0; i < entries; i++) useDocStore.getState().redo();
      expect(useDocStore.getState().doc).toBe(states[states.length - 1]);
      if (entries > 0) {
        useDocStore.getState().undo();
        expect(useDocStore.getState().doc).toBe(states[states.length - 2]);
        useDocStore.getState().redo();
        expect(useDocStore.getState().doc).toBe(states[states.length - 1]);
      }
    }), { seed: 7, verbose: true });
  });

  it('a drag gesture of many moves is one undo entry, computed from the start snapshot', () => {
    const start = useDocStore.getState().doc;
    const s = useDocStore.getState();
    s.beginGesture();
    for (let k = 1; k <= 20; k++) {
      const from = useDocStore.getState().gestureStart!;
      useDocStore.getState().apply(() => moveHorizon(from, 'h1', [k, 0]));
    }
    useDocStore.getState().endGesture();
    expect(useDocStore.getState().past).toHaveLength(1);
    expect(useDocStore.getState().doc.horizons[0].pointsPx[0]).toEqual([20, 100]);
    useDocStore.getState().undo();
    expect(useDocStore.getState().doc).toBe(start);
  });

  it('cancelGesture reverts to the document at the start of the gesture and records nothing', () => {
    const start = useDocStore.getState().doc;
    useDocStore.getState().beginGesture();
    useDocStore.getState().apply((d) => moveVertex(d, 'h1', 0, [9, 9]));
    useDocStore.getState().cancelGesture();
    expect(useDocStore.getState().doc).toBe(start);
    expect(useDocStore.getState().past).toHaveLength(0);
  });

  it('every command\'s document is plain JSON: a JSON round trip returns an equal document', () => {
    for (const c of commands) {
      const doc = c(fixtureDoc());
      expect(JSON.parse(JSON.stringify(doc))).toEqual(doc);
    }
  });
});

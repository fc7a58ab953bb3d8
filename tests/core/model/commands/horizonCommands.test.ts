// The horizon edit commands: pure (inputs frozen), index bookkeeping of projected runs, refusals.
import { describe, expect, it } from 'vitest';
import { addHorizon, nextHorizonId } from '../../../../src/core/model/commands/addHorizon';
import { deleteHorizon } from '../../../../src/core/model/commands/deleteHorizon';
import { deleteVertex } from '../../../../src/core/model/commands/deleteVertex';
import { insertVertex } from '../../../../src/core/model/commands/insertVertex';
import { moveHorizon } from '../../../../src/core/model/commands/moveHorizon';
import { moveVertex } from '../../../../src/core/model/commands/moveVertex';
import { horizonNameTaken } from '../../../../src/core/model/commands/horizonNameTaken';
import { nextHorizonName } from '../../../../src/core/model/commands/nextHorizonName';
import { importHorizons } from '../../../../src/core/model/commands/importHorizons';
import { renameHorizon } from '../../../../src/core/model/commands/renameHorizon';
import { reorderHorizons } from '../../../../src/core/model/commands/reorderHorizons';
import { setHorizonPoints } from '../../../../src/core/model/commands/setHorizonPoints';
import { setHorizonStyle } from '../../../../src/core/model/commands/setHorizonStyle';
import { isProjectedRun, setProjected } from '../../../../src/core/model/commands/setProjected';
import { setRegional } from '../../../../src/core/model/commands/setRegional';
import { fixtureDoc } from './docFixture';

const h = (doc: ReturnType<typeof fixtureDoc>, id: string) => doc.horizons.find((k) => k.id === id)!;

describe('horizon commands', () => {
  it('addHorizon(doc, horizon) appends a visible, unlocked horizon with the next free id', () => {
    const doc = fixtureDoc();
    expect(nextHorizonId(doc)).toBe('h3');
    const next = addHorizon(doc, { id: 'h3', name: 'Base', colour: '#000', pointsPx: [[0, 300], [1000, 300]] });
    expect(next.horizons.map((k) => k.id)).toEqual(['h1', 'h2', 'h3']);
    expect(h(next, 'h3')).toMatchObject({ visible: true, locked: false, projected: [] });
    expect(addHorizon(next, { id: 'h3', name: 'again', colour: '#000', pointsPx: [] })).toBe(next);
  });

  // The README's section file and the validator (validateSectionArrays, code "duplicate-name") refuse a
  // horizon name used twice: a new horizon's default name must be one that no horizon has yet.
  it('addHorizon(doc, horizon) without a name gives the next "Horizon N" that no horizon has, even after renames', () => {
    let doc = fixtureDoc(); // h1 "Upper", h2 "Lower"
    // The common case: the id's number ("h3" → "Horizon 3").
    expect(h(addHorizon(doc, { id: 'h3', colour: '#000', pointsPx: [[0, 300], [1000, 300]] }), 'h3').name).toBe('Horizon 3');
    // Renamed so that "Horizon 3" and "Horizon 4" are taken: the new h3 skips both.
    doc = renameHorizon(renameHorizon(doc, 'h1', 'Horizon 3'), 'h2', 'Horizon 4');
    expect(nextHorizonId(doc)).toBe('h3');
    expect(nextHorizonName(doc, 'h3')).toBe('Horizon 5');
    const added = addHorizon(doc, { id: 'h3', colour: '#000', pointsPx: [[0, 300], [1000, 300]] });
    expect(h(added, 'h3').name).toBe('Horizon 5');
    expect(new Set(added.horizons.map((k) => k.name)).size).toBe(added.horizons.length);
    // A blank name is no name; a given name another horizon has gets " (2)", never a second copy.
    expect(h(addHorizon(doc, { id: 'h3', name: '  ', colour: '#000', pointsPx: [] }), 'h3').name).toBe('Horizon 5');
    expect(h(addHorizon(doc, { id: 'h3', name: 'Horizon 4', colour: '#000', pointsPx: [] }), 'h3').name).toBe('Horizon 4 (2)');
  });

  it('importHorizons and addHorizon take ids by one rule (h after the highest hN); ids of an older form are kept', () => {
    const imported = importHorizons(fixtureDoc(), [{ name: 'Horizon 1', line: [[0, 0], [10, 5]] }, { name: 'Horizon 2', line: [[0, -5], [10, -6]] }], 'm');
    expect(imported.horizons.map((k) => k.id)).toEqual(['h1', 'h2', 'h3', 'h4']);
    expect(nextHorizonId(imported)).toBe('h5');
    // A document saved with ids of the older form ("horizon-1") keeps them; a new horizon gets h1, no clash.
    const older = { ...fixtureDoc(), horizons: fixtureDoc().horizons.map((k, i) => ({ ...k, id: `horizon-${i + 1}` })) };
    const next = importHorizons(older, [{ name: 'Horizon 1', line: [[0, 0], [10, 5]] }], 'm');
    expect(next.horizons.map((k) => k.id)).toEqual(['horizon-1', 'horizon-2', 'h1']);
    // Its unnamed-style name is not repeated by the next drawn horizon.
    const added = addHorizon(next, { id: nextHorizonId(next), colour: '#000', pointsPx: [[0, 300], [1000, 300]] });
    expect(added.horizons.map((k) => k.id)).toEqual(['horizon-1', 'horizon-2', 'h1', 'h2']);
    expect(new Set(added.horizons.map((k) => k.name)).size).toBe(4);
  });

  it('moveVertex(doc, id, i, p) moves one vertex and leaves the others and the input untouched', () => {
    const doc = fixtureDoc();
    const next = moveVertex(doc, 'h1', 2, [510, 30]);
    expect(h(next, 'h1').pointsPx[2]).toEqual([510, 30]);
    expect(h(next, 'h1').pointsPx[1]).toBe(h(doc, 'h1').pointsPx[1]);
    expect(h(next, 'h2')).toBe(h(doc, 'h2'));
    expect(moveVertex(doc, 'h1', 9, [0, 0])).toBe(doc);
    expect(moveVertex(doc, 'nope', 0, [0, 0])).toBe(doc);
  });

  it('insertVertex(doc, id, i, p) inside a projected run extends the run; before it shifts it', () => {
    const doc = fixtureDoc(); // h1 projected run [1, 3]
    const inside = insertVertex(doc, 'h1', 2, [350, 70]);
    expect(h(inside, 'h1').pointsPx).toHaveLength(6);
    expect(h(inside, 'h1').projected).toEqual([[1, 4]]);
    const before = insertVertex(doc, 'h1', 1, [100, 100]);
    expect(h(before, 'h1').projected).toEqual([[2, 4]]);
    const after = insertVertex(doc, 'h1', 4, [900, 100]);
    expect(h(after, 'h1').projected).toEqual([[1, 3]]);
  });

  it('deleteVertex(doc, id, i) shrinks or drops projected runs and keeps at least two vertices', () => {
    const doc = fixtureDoc();
    const mid = deleteVertex(doc, 'h1', 2);
    expect(h(mid, 'h1').pointsPx).toEqual([[0, 100], [200, 100], [800, 100], [1000, 100]]);
    expect(h(mid, 'h1').projected).toEqual([[1, 2]]);
    const first = deleteVertex(doc, 'h1', 0);
    expect(h(first, 'h1').projected).toEqual([[0, 2]]);
    let small = setHorizonPoints(doc, 'h2', [[0, 0], [10, 0]]);
    small = deleteVertex(small, 'h2', 0);
    expect(h(small, 'h2').pointsPx).toHaveLength(2);
  });

  it('moveHorizon(doc, id, delta) moves every vertex by the delta; a zero delta is no change', () => {
    const doc = fixtureDoc();
    const next = moveHorizon(doc, 'h2', [5, -7]);
    expect(h(next, 'h2').pointsPx).toEqual(h(doc, 'h2').pointsPx.map(([u, v]) => [u + 5, v - 7]));
    expect(moveHorizon(doc, 'h2', [0, 0])).toBe(doc);
  });

  it('setProjected(doc, id, run, on) merges touching runs and unmarks a part of a run', () => {
    const doc = fixtureDoc(); // [1, 3]
    const merged = setProjected(doc, 'h1', [3, 4], true);
    expect(h(merged, 'h1').projected).toEqual([[1, 4]]);
    const split = setProjected(merged, 'h1', [2, 3], false);
    expect(h(split, 'h1').projected).toEqual([[1, 2], [3, 4]]);
    expect(isProjectedRun(h(split, 'h1').projected, [1, 2])).toBe(true);
    expect(isProjectedRun(h(split, 'h1').projected, [1, 3])).toBe(false);
    const reversed = setProjected(doc, 'h2', [3, 1], true);
    expect(h(reversed, 'h2').projected).toEqual([[1, 3]]);
  });

  it('renameHorizon, setHorizonStyle and reorderHorizons change only what they name', () => {
    const doc = fixtureDoc();
    expect(h(renameHorizon(doc, 'h1', '  Top sand  '), 'h1').name).toBe('Top sand');
    expect(renameHorizon(doc, 'h1', '   ')).toBe(doc);
    const styled = setHorizonStyle(doc, 'h2', { colour: '#123456', locked: true });
    expect(h(styled, 'h2')).toMatchObject({ colour: '#123456', locked: true, visible: true });
    expect(setHorizonStyle(doc, 'h2', { visible: true })).toBe(doc);
    expect(reorderHorizons(doc, 0, 1).horizons.map((k) => k.id)).toEqual(['h2', 'h1']);
    expect(reorderHorizons(doc, 0, 5)).toBe(doc);
  });

  it('renameHorizon(doc, id, name) refuses a name another horizon has, so the section never holds one name twice', () => {
    const doc = fixtureDoc(); // h1 "Upper", h2 "Lower"
    expect(horizonNameTaken(doc, 'h1', ' Lower ')).toBe(true);
    expect(horizonNameTaken(doc, 'h1', 'Upper')).toBe(false);
    expect(horizonNameTaken(doc, 'h1', '   ')).toBe(false);
    expect(renameHorizon(doc, 'h1', 'Lower')).toBe(doc);
    expect(renameHorizon(doc, 'h1', '  Lower  ')).toBe(doc);
    // Names differ by case only are distinct names for the analysis (it compares names exactly).
    expect(h(renameHorizon(doc, 'h1', 'lower'), 'h1').name).toBe('lower');
    const renamed = renameHorizon(doc, 'h1', 'Middle');
    expect(new Set(renamed.horizons.map((k) => k.name)).size).toBe(renamed.horizons.length);
  });

  it('deleteHorizon(doc, id) removes the horizon with its regionals and exclusions in every scenario', () => {
    let doc = setRegional(fixtureDoc(), 'h1', [[0, 100], [1000, 100]]);
    doc = { ...doc, scenarios: doc.scenarios.map((s) => ({ ...s, excluded: ['h1'] })) };
    const next = deleteHorizon(doc, 'h1');
    expect(next.horizons.map((k) => k.id)).toEqual(['h2']);
    expect(next.scenarios[0].regionals).toEqual({});
    expect(next.scenarios[0].excluded).toEqual([]);
  });
});

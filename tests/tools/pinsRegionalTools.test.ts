import { describe, expect, it } from 'vitest';
import { imageToSection } from '../../src/core/calibration/mapPoints';
import { sectionFrame } from '../../src/core/model/commands/sectionFrame';
import { setPins } from '../../src/core/model/commands/setPins';
import { setRegional } from '../../src/core/model/commands/setRegional';
import { pinsTool } from '../../src/tools/pins/pinsTool';
import { regionalTool } from '../../src/tools/regional/regionalTool';
import { useDocStore } from '../../src/state/docStore';
import { ToolHarness } from './toolHarness';
import { toolDoc } from './toolFixture';

describe('pinsTool', () => {
  it('pinsTool: two clicks place the pins left to right (one undo entry)', () => {
    const t = new ToolHarness(pinsTool, toolDoc());
    t.click([900, 300]);
    expect(t.state.name).toBe('placing');
    expect(t.preview?.pinXs).toEqual([9000]);
    t.click([100, 250]);
    expect(t.doc.scenarios[0].pinsPx).toEqual([[100, 250], [900, 300]]);
    expect(t.path).toEqual(['idle', 'placing', 'idle']);
    expect(t.history).toHaveLength(1);
  });

  it('pinsTool: dragging near a pin line (any height) moves that pin; cancel restores it', () => {
    const t = new ToolHarness(pinsTool, setPins(toolDoc(), [[100, 250], [900, 250]]));
    t.drag([902, 10], [950, 60]);
    expect(t.doc.scenarios[0].pinsPx).toEqual([[100, 250], [948, 300]]);
    expect(t.history).toHaveLength(1);
    const start = t.doc;
    t.down([100, 400]).move([20, 400]).cancel();
    expect(t.doc).toBe(start);
  });
});

describe('regionalTool', () => {
  it('regionalTool: with a horizon selected, a click then a double-click draws a straight regional', () => {
    const t = new ToolHarness(regionalTool, toolDoc());
    t.click([0, 100]);
    expect(t.messages[0]).toMatch(/Select a horizon/);
    t.selected = 'h1';
    t.click([0, 100]).click([1000, 100]).click([1000, 100], { clicks: 2 });
    expect(t.doc.scenarios[0].regionals.h1).toEqual([[0, 100], [1000, 100]]);
    expect(t.path).toEqual(['idle', 'placing', 'idle']);
    expect(t.history).toHaveLength(1);
  });

  it('regionalTool: dragging a handle moves that point; dragging the line moves it straight up in the section', () => {
    const doc = setRegional(toolDoc(), 'h1', [[0, 100], [1000, 100]]);
    const t = new ToolHarness(regionalTool, doc);
    t.drag([1000, 102], [1000, 90]);
    expect(t.doc.scenarios[0].regionals.h1).toEqual([[0, 100], [1000, 88]]);
    t.drag([500, 94], [520, 84]);
    const frame = sectionFrame(t.doc);
    const reg = t.doc.scenarios[0].regionals.h1.map((p) => imageToSection(frame, p));
    // Up 10 px = 100 m; x unchanged (the sideways part of the drag is ignored).
    expect(reg[0][0]).toBeCloseTo(0, 9);
    expect(reg[0][1]).toBeCloseTo(0 + 100, 9);
    expect(reg[1][1]).toBeCloseTo(120 + 100, 9);
    expect(t.history).toHaveLength(2);
  });

  it('regionalTool: Shift-drag on one regional moves every regional; cancel puts them back', () => {
    let doc = setRegional(toolDoc(), 'h1', [[0, 100], [1000, 100]]);
    doc = setRegional(doc, 'h2', [[0, 300], [1000, 300]]);
    const t = new ToolHarness(regionalTool, doc);
    t.down([500, 100], { shift: true }).move([500, 95]);
    expect(t.doc.scenarios[0].regionals.h2[0][1]).toBeCloseTo(295, 9);
    t.cancel();
    expect(t.doc).toBe(doc);
    t.drag([500, 100], [500, 80], { shift: true });
    expect(t.doc.scenarios[0].regionals.h1[1][1]).toBeCloseTo(80, 9);
    expect(t.doc.scenarios[0].regionals.h2[1][1]).toBeCloseTo(280, 9);
    expect(t.history).toHaveLength(1);
  });

  it('regionalTool: the press names the regionals the drag moves (one, or with Shift every one that exists); the release clears them', () => {
    const two = toolDoc();
    two.horizons = [...two.horizons, { ...two.horizons[0], id: 'h2', name: 'Lower', pointsPx: [[0, 320], [1000, 320]] }];
    let doc = setRegional(two, 'h1', [[0, 100], [1000, 100]]);
    doc = setRegional(doc, 'h2', [[0, 300], [1000, 300]]);
    const t = new ToolHarness(regionalTool, doc);
    t.down([500, 300]);
    expect(useDocStore.getState().gestureRegionals).toEqual(['h2']);
    t.up([500, 300]);
    expect(useDocStore.getState().gestureRegionals).toEqual([]);
    t.down([1000, 101], { shift: true });
    // A handle drag moves that one point whatever Shift says.
    expect(useDocStore.getState().gestureRegionals).toEqual(['h1']);
    t.cancel();
    expect(useDocStore.getState().gestureRegionals).toEqual([]);
    t.down([500, 100], { shift: true });
    expect(useDocStore.getState().gestureRegionals).toEqual(['h1', 'h2']);
    t.move([500, 90]).up([500, 90]);
    expect(useDocStore.getState().gestureRegionals).toEqual([]);
    expect(t.doc.scenarios[0].regionals.h2[0][1]).toBeCloseTo(290, 9);
  });

  it('regionalTool: a polyline regional by clicks and Enter; Backspace and Esc while placing', () => {
    const t = new ToolHarness(regionalTool, toolDoc());
    t.selected = 'h1';
    t.click([0, 110]).click([400, 105]).click([700, 102]).key('Backspace').click([1000, 100]).key('Enter');
    expect(t.doc.scenarios[0].regionals.h1).toEqual([[0, 110], [400, 105], [1000, 100]]);
    const u = new ToolHarness(regionalTool, toolDoc());
    u.selected = 'h1';
    u.click([0, 110]).click([400, 105]).cancel();
    expect(u.doc.scenarios[0].regionals).toEqual({});
    expect(u.state.name).toBe('idle');
  });
});

describe('clicks without a move', () => {
  it('regionalTool and pinsTool: pressing a handle or pin without moving leaves no undo entry', () => {
    let doc = setRegional(toolDoc(), 'h1', [[0, 100], [1000, 100]]);
    doc = setPins(doc, [[100, 250], [900, 250]]);
    const r = new ToolHarness(regionalTool, doc);
    r.click([1000, 100]).click([500, 100]);
    expect(r.history).toHaveLength(0);
    const p = new ToolHarness(pinsTool, doc);
    p.click([100, 250]);
    expect(p.history).toHaveLength(0);
    expect(p.doc).toBe(doc);
  });
});

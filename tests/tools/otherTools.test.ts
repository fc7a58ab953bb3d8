import { describe, expect, it } from 'vitest';
import { calibrateTool } from '../../src/tools/calibrate/calibrateTool';
import { markProjectedTool } from '../../src/tools/markProjected/markProjectedTool';
import { selectTool } from '../../src/tools/select/selectTool';
import { TOOLS } from '../../src/tools/toolRegistry';
import { runTool } from '../../src/tools/toolTypes';
import { emptyProjectDoc } from '../../src/core/model/projectDoc';
import { sectionFrame } from '../../src/core/model/commands/sectionFrame';
import { ToolHarness } from './toolHarness';
import { toolDoc } from './toolFixture';

describe('markProjectedTool', () => {
  it('markProjectedTool: first and last vertex mark the run projected; the same run again unmarks it', () => {
    const t = new ToolHarness(markProjectedTool, toolDoc());
    t.click([200, 100]);
    expect(t.state.name).toBe('marking');
    t.click([800, 101]);
    expect(t.doc.horizons[0].projected).toEqual([[1, 3]]);
    t.click([800, 100]).click([200, 100]);
    expect(t.doc.horizons[0].projected).toEqual([]);
    expect(t.path).toEqual(['idle', 'marking', 'idle', 'marking', 'idle']);
    expect(t.history).toHaveLength(2);
    t.click([200, 100]).cancel();
    expect(t.state.name).toBe('idle');
    expect(t.history).toHaveLength(2);
  });
});

describe('calibrateTool', () => {
  it('calibrateTool: a click adds a control point with the value the fit predicts and asks to focus it', () => {
    const t = new ToolHarness(calibrateTool, toolDoc());
    t.click([1000, 500]);
    expect(t.doc.calibration).toMatchObject({ kind: 'affine' });
    const points = t.doc.calibration?.kind === 'affine' ? t.doc.calibration.points : [];
    expect(points[3]).toEqual({ u: 1000, v: 500, x: 10_000, z: -4000 });
    expect(t.focused).toEqual({ list: 'points', index: 3 });
  });

  it('calibrateTool: per-axis picks add known-x or known-z points; dragging a point moves it (one entry)', () => {
    const t = new ToolHarness(calibrateTool, emptyProjectDoc());
    t.calibrationPick = 'xPoints';
    t.click([10, 10]);
    t.calibrationPick = 'zPoints';
    t.click([20, 200]);
    expect(t.doc.calibration).toEqual({ kind: 'axes', xPoints: [{ u: 10, v: 10, value: 0 }], zPoints: [{ u: 20, v: 200, value: 0 }] });
    t.drag([21, 201], [41, 221]);
    expect(t.doc.calibration).toMatchObject({ zPoints: [{ u: 40, v: 220, value: 0 }] });
    expect(t.history).toHaveLength(3);
    const before = t.doc;
    t.down([40, 220]).move([90, 90]).cancel();
    expect(t.doc).toBe(before);
  });
});

describe('selectTool', () => {
  it('selectTool: a click on a line selects its horizon; elsewhere clears the selection', () => {
    const t = new ToolHarness(selectTool, toolDoc());
    t.click([350, 70]);
    expect(t.selected).toBe('h1');
    t.click([350, 400]);
    expect(t.selected).toBeNull();
  });
});

describe('every tool', () => {
  it('every state of every tool handles cancel and the tool ends up in its initial state with no gesture open', () => {
    for (const { tool } of TOOLS) {
      for (const name of Object.keys(tool.states)) {
        const handlers = (tool.states as Record<string, Record<string, unknown>>)[name];
        expect(typeof handlers.cancel, `${tool.id}.${name}.cancel`).toBe('function');
        const doc = toolDoc();
        const out = runTool(tool, { ...tool.initial, name } as { name: string }, { type: 'cancel' }, { doc, frame: sectionFrame(doc), tolerancePx: 5, selectedHorizonId: null, calibrationPick: 'points' });
        expect(out.state.name, `${tool.id}.${name} after cancel`).toBe(tool.initial.name);
        expect(out.commands.some((c) => c.type === 'beginGesture' || c.type === 'edit')).toBe(false);
      }
    }
  });
});

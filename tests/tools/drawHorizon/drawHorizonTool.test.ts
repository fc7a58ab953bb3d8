import { describe, expect, it } from 'vitest';
import { drawHorizonTool } from '../../../src/tools/drawHorizon/drawHorizonTool';
import { renameHorizon } from '../../../src/core/model/commands/renameHorizon';
import { ToolHarness } from '../toolHarness';
import { toolDoc } from '../toolFixture';

describe('drawHorizonTool', () => {
  it('drawHorizonTool: clicks place vertices and a double-click finishes one horizon (one undo entry per stretch)', () => {
    const t = new ToolHarness(drawHorizonTool, toolDoc());
    t.click([10, 300]).click([200, 280]).click([400, 250]);
    expect(t.state).toMatchObject({ name: 'placing', points: [[10, 300], [200, 280], [400, 250]] });
    expect(t.doc.horizons).toHaveLength(1);
    // A double-click is two presses: the first places the last vertex, the second (clicks = 2) finishes.
    t.click([600, 300]).click([600, 300], { clicks: 2 });
    expect(t.path).toEqual(['idle', 'placing', 'idle']);
    expect(t.doc.horizons).toHaveLength(2);
    expect(t.doc.horizons[1]).toMatchObject({ id: 'h2', name: 'Horizon 2', pointsPx: [[10, 300], [200, 280], [400, 250], [600, 300]] });
    expect(t.selected).toBe('h2');
    // Three stretches, three undo entries: before the line, with its first stretch, with two.
    expect(t.history).toHaveLength(3);
    expect(t.history[0].horizons).toHaveLength(1);
    expect(t.history[1].horizons[1].pointsPx).toEqual([[10, 300], [200, 280]]);
    expect(t.history[2].horizons[1].pointsPx).toEqual([[10, 300], [200, 280], [400, 250]]);
    expect(t.preview).toBeNull();
  });

  it('drawHorizonTool: Enter finishes, Backspace removes the last vertex, the rubber band follows the pointer', () => {
    const t = new ToolHarness(drawHorizonTool, toolDoc());
    t.click([0, 0]).click([10, 10]).click([20, 30]);
    t.move([25, 35]);
    expect(t.preview?.line).toEqual([[0, 0], [10, 10], [20, 30], [25, 35]]);
    t.key('Backspace');
    expect(t.state).toMatchObject({ points: [[0, 0], [10, 10]] });
    t.key('Enter');
    expect(t.doc.horizons[1].pointsPx).toEqual([[0, 0], [10, 10]]);
  });

  it('drawHorizonTool: Esc (cancel) discards the line; Backspace of the only vertex returns to idle', () => {
    const t = new ToolHarness(drawHorizonTool, toolDoc());
    t.click([0, 0]).click([10, 10]).cancel();
    expect(t.state.name).toBe('idle');
    expect(t.doc.horizons).toHaveLength(1);
    expect(t.preview).toBeNull();
    t.click([5, 5]).key('Backspace');
    expect(t.state.name).toBe('idle');
    expect(t.history).toHaveLength(0);
  });

  it('drawHorizonTool: a line of one vertex is not added, with a message; other buttons are ignored', () => {
    const t = new ToolHarness(drawHorizonTool, toolDoc());
    t.down([1, 1], { button: 2 });
    expect(t.state.name).toBe('idle');
    t.click([0, 0]).key('Enter');
    expect(t.doc.horizons).toHaveLength(1);
    expect(t.messages[0]).toMatch(/two vertices/);
  });

  it('drawHorizonTool: a finished line takes a name no horizon has, when an earlier one was renamed "Horizon 2"', () => {
    // Names must be unique (README, section file; the validator's "duplicate-name").
    const t = new ToolHarness(drawHorizonTool, renameHorizon(toolDoc(), 'h1', 'Horizon 2'));
    t.click([0, 0]).click([10, 10]).key('Enter');
    expect(t.doc.horizons.map((h) => [h.id, h.name])).toEqual([['h1', 'Horizon 2'], ['h2', 'Horizon 3']]);
  });
});

import { describe, expect, it } from 'vitest';
import { setHorizonStyle } from '../../../src/core/model/commands/setHorizonStyle';
import type { ProjectDoc } from '../../../src/core/model/projectDoc';
import { editHorizonTool } from '../../../src/tools/editHorizon/editHorizonTool';
import { ToolHarness } from '../toolHarness';
import { toolDoc } from '../toolFixture';

const pts = (t: { doc: ProjectDoc }) => t.doc.horizons[0].pointsPx;

describe('editHorizonTool', () => {
  it('editHorizonTool: dragging a vertex moves it by the total delta, one undo entry for the whole drag', () => {
    const t = new ToolHarness(editHorizonTool, toolDoc());
    t.drag([501, 41], [521, 11], {}, 6);
    expect(t.path).toEqual(['idle', 'dragging', 'idle']);
    expect(pts(t)[2]).toEqual([520, 10]);
    expect(t.history).toHaveLength(1);
    expect(t.selected).toBe('h1');
  });

  it('editHorizonTool: pressing on a segment inserts a vertex there and drags it', () => {
    const t = new ToolHarness(editHorizonTool, toolDoc());
    t.drag([100, 101], [100, 130]);
    expect(pts(t)).toHaveLength(6);
    expect(pts(t)[1]).toEqual([100, 129]);
    expect(t.history).toHaveLength(1);
  });

  it('editHorizonTool: Shift-drag moves the whole line', () => {
    const t = new ToolHarness(editHorizonTool, toolDoc());
    const before = pts(t);
    t.drag([300, 81], [310, 101], { shift: true });
    expect(pts(t)).toEqual(before.map(([u, v]) => [u + 10, v + 20]));
    expect(t.history).toHaveLength(1);
  });

  it('editHorizonTool: Alt-click deletes a vertex; click then Delete deletes the picked one', () => {
    const t = new ToolHarness(editHorizonTool, toolDoc());
    t.click([800, 100], { alt: true });
    expect(pts(t)).toHaveLength(4);
    t.click([500, 40]);
    expect(t.state).toMatchObject({ name: 'idle', picked: { horizonId: 'h1', index: 2 } });
    t.key('Delete');
    expect(pts(t)).toEqual([[0, 100], [200, 100], [1000, 100]]);
    expect(t.history).toHaveLength(2);
  });

  it('editHorizonTool: cancel during a drag restores the start; hidden and locked horizons are not picked', () => {
    const t = new ToolHarness(editHorizonTool, toolDoc());
    const start = t.doc;
    t.down([500, 40]).move([600, 200]);
    expect(pts(t)[2]).toEqual([600, 200]);
    t.cancel();
    expect(t.doc).toBe(start);
    expect(t.state.name).toBe('idle');
    expect(t.history).toHaveLength(0);
    const locked = new ToolHarness(editHorizonTool, setHorizonStyle(toolDoc(), 'h1', { locked: true }));
    locked.drag([500, 40], [600, 200]);
    expect(locked.doc.horizons[0].pointsPx[2]).toEqual([500, 40]);
    expect(locked.path).toEqual(['idle']);
  });
});

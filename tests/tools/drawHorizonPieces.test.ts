import { describe, expect, it } from 'vitest';
import type { DocFault, ProjectDoc } from '../../src/core/model/projectDoc';
import { drawHorizonTool } from '../../src/tools/drawHorizon/drawHorizonTool';
import { editHorizonTool } from '../../src/tools/editHorizon/editHorizonTool';
import { drawFaultTool } from '../../src/tools/fault/drawFaultTool';
import { nearestOnFault } from '../../src/tools/faultHits';
import { FAULT_COLOURS } from '../../src/core/model/horizonPalette';
import { HORIZON_PALETTE } from '../../src/core/model/horizonPalette';
import { ToolHarness } from './toolHarness';
import { toolDoc } from './toolFixture';

// A straight fault from (300, 0) down to (500, 400) in image px: at v = 200 it is at u = 400.
const fault: DocFault = { id: 'fault-1', name: 'Fault 1', colour: '#1c1c1c', visible: true, locked: false, pointsPx: [[300, 0], [500, 400]] };

function faultedDoc(): ProjectDoc {
  return { ...toolDoc(), faults: [fault] };
}

const onFault = (p: [number, number]) => nearestOnFault(fault.pointsPx, p)!.distance;

describe('drawing a horizon in pieces', () => {
  it('a click near a fault ends the piece on it; the next click starts the next piece on the same fault', () => {
    const t = new ToolHarness(drawHorizonTool, faultedDoc());
    t.click([10, 300]).click([200, 280]);
    // 1.8 px from the fault (within the 5 px tolerance): lands exactly on it.
    t.click([402, 200]);
    expect(t.state.name).toBe('continuing');
    // Far from the fault: projected onto it (hand-computed foot of the perpendicular, t = 0.96).
    t.click([600, 330]);
    expect(t.state).toMatchObject({ name: 'placing', points: [[492, 384]] });
    t.click([800, 350]).key('Enter');
    const h = t.doc.horizons[1];
    expect(h.pointsPx).toHaveLength(5);
    expect(h.joins).toEqual([{ at: 3, faultId: 'fault-1' }]);
    expect(onFault(h.pointsPx[2])).toBeLessThan(1e-12);
    expect(onFault(h.pointsPx[3])).toBe(0);
    expect(h.pointsPx[3]).toEqual([492, 384]);
    // One undo entry per stretch: two in the first piece, one in the second (which brings the join).
    expect(t.history).toHaveLength(3);
    expect(t.history[2].horizons[1].joins).toEqual([]);
    expect(t.doc.horizons[1].joins).toHaveLength(1);
  });

  it('a click away from faults goes on drawing the same piece, and a horizon without faults has no joins', () => {
    const t = new ToolHarness(drawHorizonTool, faultedDoc());
    t.click([10, 300]).click([200, 280]).click([380, 200]).click([380, 200], { clicks: 2 });
    expect(t.doc.horizons[1].joins).toEqual([]);
    expect(t.doc.horizons[1].pointsPx).toHaveLength(3);
  });

  it('Backspace after a piece ended takes back the click that ended it; Esc drops the whole horizon', () => {
    const t = new ToolHarness(drawHorizonTool, faultedDoc());
    t.click([10, 300]).click([200, 280]).click([402, 200]);
    t.key('Backspace');
    expect(t.state).toMatchObject({ name: 'placing', points: [[10, 300], [200, 280]] });
    t.click([402, 200]).click([600, 330]);
    t.key('Backspace');
    expect(t.state.name).toBe('continuing');
    t.send({ type: 'cancel' });
    expect(t.doc.horizons).toHaveLength(1);
    expect(t.preview).toBeNull();
  });

  it('finishing right after a piece ended keeps the pieces drawn, without a dangling join', () => {
    const t = new ToolHarness(drawHorizonTool, faultedDoc());
    t.click([10, 300]).click([200, 280]).click([402, 200]).key('Enter');
    expect(t.doc.horizons[1].joins).toEqual([]);
    expect(t.doc.horizons[1].pointsPx).toHaveLength(3);
  });

  it('the preview shows every piece and marks the cutoff under the pointer', () => {
    const t = new ToolHarness(drawHorizonTool, faultedDoc());
    t.click([10, 300]).click([200, 280]).click([402, 200]).click([600, 330]);
    t.move([700, 340]);
    expect(t.preview?.lines).toHaveLength(2);
    t.move([451, 301]);
    expect(t.preview?.marks?.some((m) => onFault(m) < 1e-9 && Math.abs(m[1] - 300) < 2)).toBe(true);
  });
});

describe('editing a piece end', () => {
  it('a dragged piece end slides along its fault; other vertices move freely', () => {
    const t = new ToolHarness(drawHorizonTool, faultedDoc());
    t.click([10, 300]).click([200, 280]).click([402, 200]).click([600, 330]).click([800, 350]).key('Enter');
    const e = new ToolHarness(editHorizonTool, t.doc);
    e.drag([492, 384], [430, 330]);
    const h = e.doc.horizons[1];
    expect(onFault(h.pointsPx[3])).toBeLessThan(1e-12);
    expect(h.pointsPx[3][1]).toBeGreaterThan(250);
    expect(h.pointsPx[3][1]).toBeLessThan(384);
    e.drag([800, 350], [810, 360]);
    expect(e.doc.horizons[1].pointsPx[4]).toEqual([810, 360]);
    expect(e.history).toHaveLength(2);
  });

  it('a press between two pieces inserts nothing there (the fault, not the horizon, joins them)', () => {
    const t = new ToolHarness(drawHorizonTool, faultedDoc());
    t.click([10, 300]).click([200, 280]).click([402, 200]).click([600, 330]).click([800, 350]).key('Enter');
    const e = new ToolHarness(editHorizonTool, t.doc);
    // Midway along the straight gap from the cutoff (400, 200) to (492, 384), off the fault.
    e.selected = 'h2';
    e.drag([446, 292], [446, 250]);
    expect(e.doc.horizons[1].pointsPx).toHaveLength(5);
    // The gap lies along the fault itself: the press is on the fault, which gets the vertex.
    expect(e.doc.faults[0].pointsPx).toHaveLength(3);
  });

  it('Edit moves, inserts and removes a fault vertex (one undo entry each)', () => {
    const e = new ToolHarness(editHorizonTool, faultedDoc());
    e.drag([500, 400], [520, 410]);
    expect(e.doc.faults[0].pointsPx).toEqual([[300, 0], [520, 410]]);
    e.drag([410, 205], [380, 205]);
    expect(e.doc.faults[0].pointsPx).toHaveLength(3);
    e.click(e.doc.faults[0].pointsPx[1], { alt: true });
    expect(e.doc.faults[0].pointsPx).toHaveLength(2);
    expect(e.history).toHaveLength(3);
  });
});

describe('drawFaultTool', () => {
  it('draws a fault with the horizon gestures, in a colour none of the horizon palette has', () => {
    const t = new ToolHarness(drawFaultTool, faultedDoc());
    t.click([100, 0]).click([150, 200]).click([200, 400]).click([200, 400], { clicks: 2 });
    expect(t.doc.faults).toHaveLength(2);
    const f = t.doc.faults[1];
    expect(f.pointsPx).toEqual([[100, 0], [150, 200], [200, 400]]);
    expect(FAULT_COLOURS).toContain(f.colour);
    expect(HORIZON_PALETTE as readonly string[]).not.toContain(f.colour);
    expect(t.doc.horizons).toHaveLength(1);
    expect(t.history).toHaveLength(2);
  });

  it('a fault drawn near another fault does not end there (faults are one piece)', () => {
    const t = new ToolHarness(drawFaultTool, faultedDoc());
    t.click([350, 50]).click([402, 200]).click([450, 300]).key('Enter');
    expect(t.doc.faults[1].pointsPx).toEqual([[350, 50], [402, 200], [450, 300]]);
  });
});

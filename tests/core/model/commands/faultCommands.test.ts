// Fault commands and the cuts of horizons by faults (pure doc -> doc), and the store actions that apply
// them as one undo step each. Geometry checks are analytic (points on a straight segment, distances).
import { beforeEach, describe, expect, it } from 'vitest';
import { nearestOnPolyline } from '../../../../src/core/geometry/nearestOnPolyline';
import { addFault } from '../../../../src/core/model/commands/addFault';
import { addJoin } from '../../../../src/core/model/commands/addJoin';
import { deleteFault } from '../../../../src/core/model/commands/deleteFault';
import { deleteVertex } from '../../../../src/core/model/commands/deleteVertex';
import { insertVertex } from '../../../../src/core/model/commands/insertVertex';
import { moveFaultVertex } from '../../../../src/core/model/commands/moveFaultVertex';
import { removeJoin } from '../../../../src/core/model/commands/removeJoin';
import { renameFault } from '../../../../src/core/model/commands/renameFault';
import { setFaultPoints } from '../../../../src/core/model/commands/setFaultPoints';
import { setFaultStyle } from '../../../../src/core/model/commands/setFaultStyle';
import { FAULT_COLOURS, HORIZON_PALETTE } from '../../../../src/core/model/horizonPalette';
import type { ImagePx, ProjectDoc } from '../../../../src/core/model/projectDoc';
import { checkProjectDoc } from '../../../../src/core/model/projectSchema';
import { useDocStore } from '../../../../src/state/docStore';
import { addFaultAction, addJoinAction, deleteFaultAction, moveFaultVertexAction, removeJoinAction, renameFaultAction, setFaultPointsAction, setFaultStyleAction } from '../../../../src/state/faultActions';
import { useSessionStore } from '../../../../src/state/sessionStore';
import { deepFreeze, fixtureDoc } from './docFixture';

// A fault dipping left through h1 (the fixture's anticline, v = 100 at its ends) between u = 200 and 500.
const faultPx: ImagePx[] = [[300, 0], [400, 300]];

/** h1 cut at vertex 2 by the fault, its two piece ends snapped onto it. */
function cutDoc(): ProjectDoc {
  const withFault = addFault(fixtureDoc(), { pointsPx: faultPx, name: 'Main thrust' });
  const h1 = withFault.horizons[0];
  // Piece 1: vertices 0–1, piece 2: 2–4 (five vertices, cut at 2).
  const points: ImagePx[] = [h1.pointsPx[0], [320, 70], [330, 90], ...h1.pointsPx.slice(3)];
  const reshaped = { ...withFault, horizons: [{ ...h1, pointsPx: points }, withFault.horizons[1]] };
  return deepFreeze(addJoin(reshaped, 'h1', 2, 'fault-1', true));
}

function distanceToFault(doc: ProjectDoc, p: ImagePx): number {
  const f = doc.faults[0].pointsPx;
  return nearestOnPolyline(f.map((q) => q[0]), f.map((q) => q[1]), p[0], p[1])!.distance;
}

describe('fault commands', () => {
  it('adds faults as fault-1, fault-2 … with free names and colours outside the horizon palette', () => {
    let d = addFault(fixtureDoc(), { pointsPx: faultPx });
    d = addFault(d, { pointsPx: faultPx, name: 'Fault 1' });
    expect(d.faults.map((f) => [f.id, f.name])).toEqual([['fault-1', 'Fault 1'], ['fault-2', 'Fault 1 (2)']]);
    for (const f of d.faults) expect(HORIZON_PALETTE as readonly string[]).not.toContain(f.colour);
    expect(FAULT_COLOURS.some((c) => (HORIZON_PALETTE as readonly string[]).includes(c))).toBe(false);
    expect(checkProjectDoc(d).ok).toBe(true);
  });

  it('renames (not to a blank name or one another fault has), recolours and sets the points', () => {
    let d = addFault(addFault(fixtureDoc(), { pointsPx: faultPx, name: 'A' }), { pointsPx: faultPx, name: 'B' });
    expect(renameFault(d, 'fault-2', ' A ')).toBe(d);
    expect(renameFault(d, 'fault-2', '  ')).toBe(d);
    d = renameFault(d, 'fault-2', ' Basal ');
    expect(d.faults[1].name).toBe('Basal');
    d = setFaultStyle(d, 'fault-2', { colour: '#333333', visible: false });
    expect(d.faults[1]).toMatchObject({ colour: '#333333', visible: false, locked: false });
    expect(setFaultStyle(d, 'fault-2', { colour: '#333333' })).toBe(d);
    d = setFaultPoints(d, 'fault-1', [[0, 0], [10, 10], [20, 30]]);
    expect(d.faults[0].pointsPx).toEqual([[0, 0], [10, 10], [20, 30]]);
  });

  it('snaps a cut\'s two piece ends onto the fault and keeps the document valid', () => {
    const d = cutDoc();
    expect(d.horizons[0].joins).toEqual([{ at: 2, faultId: 'fault-1' }]);
    expect(distanceToFault(d, d.horizons[0].pointsPx[1])).toBeLessThan(1e-9);
    expect(distanceToFault(d, d.horizons[0].pointsPx[2])).toBeLessThan(1e-9);
    expect(checkProjectDoc(d).ok).toBe(true);
  });

  it('refuses a cut that would leave a piece of one vertex, one already there, or on an unknown fault', () => {
    const d = cutDoc();
    expect(addJoin(d, 'h1', 2, 'fault-1')).toBe(d);
    expect(addJoin(d, 'h1', 1, 'fault-1')).toBe(d);
    expect(addJoin(d, 'h1', 3, 'fault-1')).toBe(d);
    expect(addJoin(d, 'h1', 4, 'fault-1')).toBe(d);
    expect(addJoin(d, 'h2', 2, 'fault-7')).toBe(d);
    expect(removeJoin(d, 'h1', 3)).toBe(d);
    expect(removeJoin(d, 'h1', 2).horizons[0].joins).toEqual([]);
  });

  it('carries the cutoffs along when a fault vertex moves, at the same place along the segment', () => {
    const d = cutDoc();
    const before = d.horizons[0].pointsPx;
    const moved = moveFaultVertex(d, 'fault-1', 1, [460, 300]);
    const after = moved.horizons[0].pointsPx;
    for (const i of [1, 2]) {
      expect(distanceToFault(moved, after[i])).toBeLessThan(1e-9);
      // v is unchanged: the fault's top vertex stays, so a point at fraction t keeps v = 300 t.
      expect(after[i][1]).toBeCloseTo(before[i][1], 9);
    }
    expect(after[0]).toBe(before[0]);
    expect(moved.horizons[1]).toBe(d.horizons[1]);
  });

  it('keeps cuts in step when vertices are inserted or deleted, and never leaves a piece of one vertex', () => {
    const d = cutDoc();
    expect(insertVertex(d, 'h1', 1, [250, 90]).horizons[0].joins).toEqual([{ at: 3, faultId: 'fault-1' }]);
    expect(insertVertex(d, 'h1', 4, [900, 100]).horizons[0].joins).toEqual([{ at: 2, faultId: 'fault-1' }]);
    expect(deleteVertex(d, 'h1', 3).horizons[0].joins).toEqual([{ at: 2, faultId: 'fault-1' }]);
    // Piece 1 has two vertices: deleting either is refused.
    expect(deleteVertex(d, 'h1', 0)).toBe(d);
    expect(deleteVertex(d, 'h1', 1)).toBe(d);
  });

  it('deletes a fault and unjoins the horizons cut by it, keeping their vertices', () => {
    const d = cutDoc();
    const gone = deleteFault(d, 'fault-1');
    expect(gone.faults).toEqual([]);
    expect(gone.horizons[0].joins).toEqual([]);
    expect(gone.horizons[0].pointsPx).toBe(d.horizons[0].pointsPx);
    expect(checkProjectDoc(gone).ok).toBe(true);
  });
});

describe('fault actions on the store', () => {
  beforeEach(() => useDocStore.getState().replace(fixtureDoc()));
  const state = () => useDocStore.getState();

  it('takes one undo step per action', () => {
    const id = addFaultAction(faultPx, { name: 'Main thrust' });
    expect(id).toBe('fault-1');
    const steps: (() => void)[] = [
      () => setFaultPointsAction(id, [[300, 0], [410, 300]]),
      () => moveFaultVertexAction(id, 1, [400, 300]),
      () => renameFaultAction(id, 'Sole thrust'),
      () => setFaultStyleAction(id, { colour: '#222222' }),
      () => addJoinAction('h1', 2, id, true),
      () => removeJoinAction('h1', 2),
      () => deleteFaultAction(id),
    ];
    for (const step of steps) {
      const before = state().doc;
      const depth = state().past.length;
      step();
      expect(state().doc).not.toBe(before);
      expect(state().past.length).toBe(depth + 1);
      state().undo();
      expect(state().doc).toBe(before);
      state().redo();
    }
    expect(state().doc.faults).toEqual([]);
  });

  it('says which horizons a deleted fault unjoins, and undo brings the joins back', () => {
    useDocStore.getState().replace(cutDoc());
    const text = deleteFaultAction('fault-1');
    expect(text).toContain('Fault "Main thrust" deleted. Horizon "Upper" was joined on it');
    expect(useSessionStore.getState().message?.text).toBe(text);
    expect(state().doc.horizons[0].joins).toEqual([]);
    state().undo();
    expect(state().doc.horizons[0].joins).toEqual([{ at: 2, faultId: 'fault-1' }]);
  });

  it('refuses a fault name another fault has, and says so', () => {
    addFaultAction(faultPx, { name: 'A' });
    const b = addFaultAction(faultPx, { name: 'B' });
    expect(renameFaultAction(b, 'A')).toBe(false);
    expect(useSessionStore.getState().message?.text).toContain('Another fault is already called "A"');
    expect(state().doc.faults[1].name).toBe('B');
  });
});

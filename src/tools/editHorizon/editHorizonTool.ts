// Edit horizons and faults: drag a vertex; press on a segment to insert a vertex there and drag it; Shift-drag
// a line to move it whole; Alt-click a vertex, or click it and press Delete, to remove it. The end of a
// horizon's piece (a cutoff) slides along its fault while dragged, so it stays on it (docs/method.md
// §Faults and horizons in pieces). Each drag is one gesture: computed from the start snapshot plus the
// total delta (one undo entry).
import { deleteVertex } from '../../core/model/commands/deleteVertex';
import { insertVertex } from '../../core/model/commands/insertVertex';
import { moveFaultVertex } from '../../core/model/commands/moveFaultVertex';
import { moveHorizon } from '../../core/model/commands/moveHorizon';
import { moveVertex } from '../../core/model/commands/moveVertex';
import { setFaultPoints } from '../../core/model/commands/setFaultPoints';
import type { ImagePx, ProjectDoc } from '../../core/model/projectDoc';
import { keepOnFault } from '../faultHits';
import { hitFault, hitHorizon } from '../horizonHits';
import type { DocEdit, Tool, ToolCommand, ToolResult } from '../toolTypes';

/** A vertex chosen for Delete: of a horizon, or of a fault (`fault`). */
export interface PickedVertex { horizonId: string; index: number; fault?: boolean }

export type EditHorizonState =
  | { name: 'idle'; picked: PickedVertex | null }
  | { name: 'dragging'; mode: 'vertex' | 'line'; horizonId: string; index: number; start: ImagePx; origin: ImagePx; inserted: boolean; fault?: boolean };

type Dragging = Extract<EditHorizonState, { name: 'dragging' }>;

const idle: EditHorizonState = { name: 'idle', picked: null };

/** Returns p kept on its fault when vertex i of the horizon is a piece end (a cutoff), else p. */
function onItsFault(doc: ProjectDoc, horizonId: string, i: number, p: ImagePx): ImagePx {
  const h = doc.horizons.find((k) => k.id === horizonId);
  const join = h?.joins.find((j) => j.at === i || j.at - 1 === i);
  const fault = join ? doc.faults.find((f) => f.id === join.faultId) : undefined;
  return fault && fault.pointsPx.length >= 2 ? keepOnFault(fault.pointsPx, p) : p;
}

function faultEdit(s: Dragging, du: number, dv: number): DocEdit {
  return (d) => {
    const f = d.faults.find((k) => k.id === s.horizonId);
    if (!f) return d;
    if (s.mode === 'line') return setFaultPoints(d, f.id, f.pointsPx.map(([u, v]) => [u + du, v + dv]));
    // A vertex moved carries the cutoffs on its two segments with it (moveFaultVertex), so they stay on the fault.
    const base = s.inserted ? setFaultPoints(d, f.id, [...f.pointsPx.slice(0, s.index), s.origin, ...f.pointsPx.slice(s.index)]) : d;
    return moveFaultVertex(base, f.id, s.index, [s.origin[0] + du, s.origin[1] + dv]);
  };
}

function dragEdit(s: Dragging, p: ImagePx): DocEdit {
  const du = p[0] - s.start[0];
  const dv = p[1] - s.start[1];
  if (s.fault) return faultEdit(s, du, dv);
  if (s.mode === 'line') return (d) => moveHorizon(d, s.horizonId, [du, dv]);
  const at: ImagePx = [s.origin[0] + du, s.origin[1] + dv];
  return (d: ProjectDoc) => {
    const base = s.inserted ? insertVertex(d, s.horizonId, s.index, s.origin) : d;
    return moveVertex(base, s.horizonId, s.index, onItsFault(base, s.horizonId, s.index, at));
  };
}

function remove(doc: ProjectDoc, picked: PickedVertex): ToolResult<EditHorizonState> {
  if (picked.fault) {
    const f = doc.faults.find((k) => k.id === picked.horizonId);
    if (!f || f.pointsPx.length <= 2) {
      return { next: idle, commands: [{ type: 'message', kind: 'info', text: 'A fault keeps at least two vertices; delete the whole fault from the list instead.' }] };
    }
    return { next: idle, commands: [{ type: 'edit', edit: (d) => setFaultPoints(d, f.id, f.pointsPx.filter((_, k) => k !== picked.index)) }, { type: 'preview', preview: null }] };
  }
  const h = doc.horizons.find((k) => k.id === picked.horizonId);
  if (!h || h.pointsPx.length <= 2) {
    return { next: idle, commands: [{ type: 'message', kind: 'info', text: 'A horizon keeps at least two vertices; delete the whole horizon from the list instead.' }] };
  }
  return { next: idle, commands: [{ type: 'edit', edit: (d) => deleteVertex(d, picked.horizonId, picked.index) }, { type: 'preview', preview: null }] };
}

export const editHorizonTool: Tool<EditHorizonState> = {
  id: 'edit',
  initial: idle,
  states: {
    idle: {
      pointerDown: (_s, e, ctx) => {
        if (e.button !== 0) return {};
        const hit = hitHorizon(ctx.doc, ctx.selectedHorizonId, e.p, ctx.tolerancePx) ?? hitFault(ctx.doc, e.p, ctx.tolerancePx);
        if (!hit) return { next: idle, commands: [{ type: 'preview', preview: null }] };
        const fault = hit.kind === 'faultVertex' || hit.kind === 'faultSegment';
        const id = fault ? hit.fault.id : hit.horizon.id;
        const points = fault ? hit.fault.pointsPx : hit.horizon.pointsPx;
        const select: ToolCommand[] = fault ? [] : [{ type: 'select', horizonId: id }];
        const onVertex = hit.kind === 'vertex' || hit.kind === 'faultVertex';
        if (onVertex && e.alt) return remove(ctx.doc, { horizonId: id, index: hit.index, fault });
        const base = { name: 'dragging' as const, horizonId: id, start: e.p, fault };
        if (e.shift) {
          return { next: { ...base, mode: 'line', index: -1, origin: e.p, inserted: false }, commands: [...select, { type: 'beginGesture' }] };
        }
        if (onVertex) {
          return { next: { ...base, mode: 'vertex', index: hit.index, origin: points[hit.index], inserted: false }, commands: [...select, { type: 'beginGesture' }] };
        }
        const next = { ...base, mode: 'vertex' as const, index: hit.index + 1, origin: hit.point, inserted: true };
        return { next, commands: [...select, { type: 'beginGesture' }, { type: 'gestureEdit', edit: dragEdit(next, e.p) }] };
      },
      key: (s, e, ctx) => {
        if ((e.key === 'Delete' || e.key === 'Backspace') && s.picked) return remove(ctx.doc, s.picked);
        return {};
      },
      cancel: () => ({ next: idle, commands: [{ type: 'preview', preview: null }] }),
    },
    dragging: {
      pointerMove: (s, e) => ({ commands: [{ type: 'gestureEdit', edit: dragEdit(s, e.p) }] }),
      pointerUp: (s, e, ctx) => {
        const picked = s.mode === 'vertex' ? { horizonId: s.horizonId, index: s.index, fault: s.fault } : null;
        const edit = dragEdit(s, e.p);
        // Mark where the vertex ended (on its fault, for a cutoff).
        const after = edit(ctx.doc);
        const pts = s.fault ? after.faults.find((f) => f.id === s.horizonId)?.pointsPx : after.horizons.find((h) => h.id === s.horizonId)?.pointsPx;
        const at = picked ? pts?.[s.index] : undefined;
        const mark: ToolCommand = { type: 'preview', preview: at ? { marks: [at] } : null };
        return { next: { name: 'idle', picked }, commands: [{ type: 'gestureEdit', edit }, { type: 'endGesture' }, mark] };
      },
      cancel: () => ({ next: idle, commands: [{ type: 'cancelGesture' }, { type: 'preview', preview: null }] }),
    },
  },
};

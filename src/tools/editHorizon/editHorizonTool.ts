// Edit horizons: drag a vertex; press on a segment to insert a vertex there and drag it; Shift-drag a
// line to move it whole; Alt-click a vertex, or click it and press Delete, to remove it.
// Each drag is one gesture: computed from the start snapshot plus the total delta (one undo entry).
import { deleteVertex } from '../../core/model/commands/deleteVertex';
import { insertVertex } from '../../core/model/commands/insertVertex';
import { moveHorizon } from '../../core/model/commands/moveHorizon';
import { moveVertex } from '../../core/model/commands/moveVertex';
import type { ImagePx, ProjectDoc } from '../../core/model/projectDoc';
import { hitHorizon } from '../horizonHits';
import type { DocEdit, Tool, ToolCommand, ToolResult } from '../toolTypes';

export interface PickedVertex { horizonId: string; index: number }

export type EditHorizonState =
  | { name: 'idle'; picked: PickedVertex | null }
  | { name: 'dragging'; mode: 'vertex' | 'line'; horizonId: string; index: number; start: ImagePx; origin: ImagePx; inserted: boolean };

const idle: EditHorizonState = { name: 'idle', picked: null };

function dragEdit(s: Extract<EditHorizonState, { name: 'dragging' }>, p: ImagePx): DocEdit {
  const du = p[0] - s.start[0];
  const dv = p[1] - s.start[1];
  if (s.mode === 'line') return (d) => moveHorizon(d, s.horizonId, [du, dv]);
  const at: ImagePx = [s.origin[0] + du, s.origin[1] + dv];
  return (d: ProjectDoc) => moveVertex(s.inserted ? insertVertex(d, s.horizonId, s.index, s.origin) : d, s.horizonId, s.index, at);
}

function remove(doc: ProjectDoc, picked: PickedVertex): ToolResult<EditHorizonState> {
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
        const hit = hitHorizon(ctx.doc, ctx.selectedHorizonId, e.p, ctx.tolerancePx);
        if (!hit) return { next: idle, commands: [{ type: 'preview', preview: null }] };
        const select: ToolCommand = { type: 'select', horizonId: hit.horizon.id };
        if (hit.kind === 'vertex' && e.alt) return remove(ctx.doc, { horizonId: hit.horizon.id, index: hit.index });
        const base = { name: 'dragging' as const, horizonId: hit.horizon.id, start: e.p };
        if (e.shift) {
          return { next: { ...base, mode: 'line', index: -1, origin: e.p, inserted: false }, commands: [select, { type: 'beginGesture' }] };
        }
        if (hit.kind === 'vertex') {
          return { next: { ...base, mode: 'vertex', index: hit.index, origin: hit.horizon.pointsPx[hit.index], inserted: false }, commands: [select, { type: 'beginGesture' }] };
        }
        const next = { ...base, mode: 'vertex' as const, index: hit.index + 1, origin: hit.point, inserted: true };
        return { next, commands: [select, { type: 'beginGesture' }, { type: 'gestureEdit', edit: dragEdit(next, e.p) }] };
      },
      key: (s, e, ctx) => {
        if ((e.key === 'Delete' || e.key === 'Backspace') && s.picked) return remove(ctx.doc, s.picked);
        return {};
      },
      cancel: () => ({ next: idle, commands: [{ type: 'preview', preview: null }] }),
    },
    dragging: {
      pointerMove: (s, e) => ({ commands: [{ type: 'gestureEdit', edit: dragEdit(s, e.p) }] }),
      pointerUp: (s, e) => {
        const picked = s.mode === 'vertex' ? { horizonId: s.horizonId, index: s.index } : null;
        const at: ImagePx = [s.origin[0] + e.p[0] - s.start[0], s.origin[1] + e.p[1] - s.start[1]];
        const mark: ToolCommand = { type: 'preview', preview: picked ? { marks: [at] } : null };
        return { next: { name: 'idle', picked }, commands: [{ type: 'gestureEdit', edit: dragEdit(s, e.p) }, { type: 'endGesture' }, mark] };
      },
      cancel: () => ({ next: idle, commands: [{ type: 'cancelGesture' }, { type: 'preview', preview: null }] }),
    },
  },
};

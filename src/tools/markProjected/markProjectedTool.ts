// Mark a run of vertices as projected (eroded, interpreted; drawn dashed): click its first vertex,
// then its last vertex on the same horizon. A run that is already projected is unmarked.
import { isProjectedRun, setProjected } from '../../core/model/commands/setProjected';
import type { ImagePx } from '../../core/model/projectDoc';
import { editableHorizons } from '../horizonHits';
import { nearestVertex } from '../hitTest';
import type { Tool } from '../toolTypes';

export type MarkProjectedState = { name: 'idle' } | { name: 'marking'; horizonId: string; from: number; at: ImagePx };

const idle: MarkProjectedState = { name: 'idle' };

function vertexUnder(list: ReturnType<typeof editableHorizons>, p: ImagePx, tol: number) {
  for (const h of list) {
    const i = nearestVertex(h.pointsPx, p, tol);
    if (i >= 0) return { horizon: h, index: i };
  }
  return null;
}

export const markProjectedTool: Tool<MarkProjectedState> = {
  id: 'projected',
  initial: idle,
  states: {
    idle: {
      pointerDown: (_s, e, ctx) => {
        if (e.button !== 0) return {};
        const hit = vertexUnder(editableHorizons(ctx.doc, ctx.selectedHorizonId), e.p, ctx.tolerancePx);
        if (!hit) return {};
        const at = hit.horizon.pointsPx[hit.index];
        return {
          next: { name: 'marking', horizonId: hit.horizon.id, from: hit.index, at },
          commands: [{ type: 'select', horizonId: hit.horizon.id }, { type: 'preview', preview: { marks: [at], colour: hit.horizon.colour } }],
        };
      },
      cancel: () => ({ commands: [{ type: 'preview', preview: null }] }),
    },
    marking: {
      pointerDown: (s, e, ctx) => {
        if (e.button !== 0) return {};
        const h = ctx.doc.horizons.find((k) => k.id === s.horizonId);
        const to = h ? nearestVertex(h.pointsPx, e.p, ctx.tolerancePx) : -1;
        if (!h || to < 0 || to === s.from) return { next: idle, commands: [{ type: 'preview', preview: null }] };
        const run: [number, number] = [Math.min(s.from, to), Math.max(s.from, to)];
        const on = !isProjectedRun(h.projected, run);
        return { next: idle, commands: [{ type: 'edit', edit: (d) => setProjected(d, s.horizonId, run, on) }, { type: 'preview', preview: null }] };
      },
      pointerMove: (s, e, ctx) => {
        const h = ctx.doc.horizons.find((k) => k.id === s.horizonId);
        if (!h) return {};
        const to = nearestVertex(h.pointsPx, e.p, ctx.tolerancePx);
        const lo = Math.min(s.from, to < 0 ? s.from : to);
        const hi = Math.max(s.from, to < 0 ? s.from : to);
        return { commands: [{ type: 'preview', preview: { marks: [s.at], line: h.pointsPx.slice(lo, hi + 1), colour: h.colour } }] };
      },
      cancel: () => ({ next: idle, commands: [{ type: 'preview', preview: null }] }),
    },
  },
};

// Draw a horizon by clicking its vertices: double-click or Enter finishes, Backspace removes the last
// vertex, Esc cancels. Nothing reaches the document until the line is finished (one undo entry).
import { addHorizon, nextHorizonId } from '../../core/model/commands/addHorizon';
import type { ImagePx, ProjectDoc } from '../../core/model/projectDoc';
import { paletteColour } from '../horizonPalette';
import type { Tool, ToolCommand, ToolResult } from '../toolTypes';

export type DrawHorizonState = { name: 'idle' } | { name: 'placing'; points: ImagePx[]; hover: ImagePx | null };

const idle: DrawHorizonState = { name: 'idle' };

function preview(points: ImagePx[], hover: ImagePx | null, doc: ProjectDoc): ToolCommand {
  return { type: 'preview', preview: { line: hover ? [...points, hover] : points, marks: points, colour: paletteColour(doc.horizons.length) } };
}

function finish(points: ImagePx[], doc: ProjectDoc): ToolResult<DrawHorizonState> {
  if (points.length < 2) {
    return { next: idle, commands: [{ type: 'preview', preview: null }, { type: 'message', kind: 'info', text: 'A horizon needs at least two vertices.' }] };
  }
  const id = nextHorizonId(doc);
  // Named by addHorizon from the document it is added to: the next "Horizon N" that no horizon has.
  const horizon = { id, colour: paletteColour(doc.horizons.length), pointsPx: points };
  return { next: idle, commands: [{ type: 'preview', preview: null }, { type: 'edit', edit: (d) => addHorizon(d, horizon) }, { type: 'select', horizonId: id }] };
}

export const drawHorizonTool: Tool<DrawHorizonState> = {
  id: 'draw',
  initial: idle,
  states: {
    idle: {
      pointerDown: (_s, e, ctx) => {
        if (e.button !== 0) return {};
        return { next: { name: 'placing', points: [e.p], hover: null }, commands: [preview([e.p], null, ctx.doc)] };
      },
      cancel: () => ({ commands: [{ type: 'preview', preview: null }] }),
    },
    placing: {
      pointerDown: (s, e, ctx) => {
        if (e.button !== 0) return {};
        // The second press of a double-click lands on the vertex the first press placed: finish instead.
        if (e.clicks >= 2) return finish(s.points, ctx.doc);
        const last = s.points[s.points.length - 1];
        if (Math.hypot(last[0] - e.p[0], last[1] - e.p[1]) < 1e-9) return {};
        const points = [...s.points, e.p];
        return { next: { ...s, points }, commands: [preview(points, null, ctx.doc)] };
      },
      pointerMove: (s, e, ctx) => ({ next: { ...s, hover: e.p }, commands: [preview(s.points, e.p, ctx.doc)] }),
      key: (s, e, ctx) => {
        if (e.key === 'Enter') return finish(s.points, ctx.doc);
        if (e.key === 'Backspace' || e.key === 'Delete') {
          const points = s.points.slice(0, -1);
          if (points.length === 0) return { next: idle, commands: [{ type: 'preview', preview: null }] };
          return { next: { ...s, points }, commands: [preview(points, s.hover, ctx.doc)] };
        }
        return {};
      },
      cancel: () => ({ next: idle, commands: [{ type: 'preview', preview: null }] }),
    },
  },
};

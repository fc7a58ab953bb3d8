// Regionals, one per horizon per scenario. With a horizon selected that has none, click its points
// (a straight regional is two clicks, the second a double-click; Enter also finishes). Drag a handle
// to move that point; drag the line to move the regional up or down; Shift-drag moves every regional.
import { imageToSection } from '../../core/calibration/mapPoints';
import { offsetRegionals } from '../../core/model/commands/offsetRegionals';
import { setRegional } from '../../core/model/commands/setRegional';
import { activeScenario } from '../../core/model/docToSection';
import type { ImagePx, ProjectDoc } from '../../core/model/projectDoc';
import { nearestSegment, nearestVertex } from '../hitTest';
import type { DocEdit, Tool, ToolContext, ToolResult } from '../toolTypes';

export type RegionalState =
  | { name: 'idle' }
  | { name: 'placing'; horizonId: string; points: ImagePx[] }
  | { name: 'dragging'; mode: 'handle' | 'whole' | 'all'; horizonId: string; index: number; start: ImagePx; origin: ImagePx[] };

const idle: RegionalState = { name: 'idle' };

type RegionalHit = { horizonId: string; kind: 'handle' | 'line'; index: number };

/** Returns the regional handle (preferred) or line under p, the selected horizon's first; null if none. */
export function regionalUnder(doc: ProjectDoc, selectedId: string | null, p: ImagePx, tol: number): RegionalHit | null {
  const regionals = activeScenario(doc).regionals;
  const ids = doc.horizons.filter((h) => h.visible && regionals[h.id]).map((h) => h.id);
  const order = selectedId && ids.includes(selectedId) ? [selectedId, ...ids.filter((id) => id !== selectedId)] : ids;
  for (const id of order) {
    const i = nearestVertex(regionals[id], p, tol);
    if (i >= 0) return { horizonId: id, kind: 'handle', index: i };
  }
  for (const id of order) {
    const s = nearestSegment(regionals[id], p, tol);
    if (s) return { horizonId: id, kind: 'line', index: s.index };
  }
  return null;
}

function dragEdit(s: Extract<RegionalState, { name: 'dragging' }>, p: ImagePx, ctx: ToolContext): DocEdit {
  // A press without a move changes nothing (and leaves no undo entry).
  if (p[0] === s.start[0] && p[1] === s.start[1]) return (d) => d;
  if (s.mode === 'handle') {
    const moved = s.origin.slice();
    moved[s.index] = [s.origin[s.index][0] + p[0] - s.start[0], s.origin[s.index][1] + p[1] - s.start[1]];
    return (d) => setRegional(d, s.horizonId, moved);
  }
  // Whole-line moves go straight up or down in the section, whatever the scan's rotation.
  const dz = imageToSection(ctx.frame, p)[1] - imageToSection(ctx.frame, s.start)[1];
  return (d) => offsetRegionals(d, s.mode === 'all' ? null : [s.horizonId], dz);
}

function preview(s: Extract<RegionalState, { name: 'placing' }>, hover: ImagePx | null, ctx: ToolContext) {
  const colour = ctx.doc.horizons.find((h) => h.id === s.horizonId)?.colour;
  return { type: 'preview' as const, preview: { line: hover ? [...s.points, hover] : s.points, marks: s.points, colour } };
}

function finish(s: Extract<RegionalState, { name: 'placing' }>): ToolResult<RegionalState> {
  if (s.points.length < 2) return { next: idle, commands: [{ type: 'preview', preview: null }, { type: 'message', kind: 'info', text: 'A regional needs at least two points.' }] };
  return { next: idle, commands: [{ type: 'preview', preview: null }, { type: 'edit', edit: (d) => setRegional(d, s.horizonId, s.points) }] };
}

export const regionalTool: Tool<RegionalState> = {
  id: 'regional',
  initial: idle,
  states: {
    idle: {
      pointerDown: (_s, e, ctx) => {
        if (e.button !== 0) return {};
        const hit = regionalUnder(ctx.doc, ctx.selectedHorizonId, e.p, ctx.tolerancePx);
        if (hit) {
          const regionals = activeScenario(ctx.doc).regionals;
          const origin = regionals[hit.horizonId];
          const mode = hit.kind === 'handle' ? 'handle' : e.shift ? 'all' : 'whole';
          // The press names what the drag will move, so the view gets ready for it before the first move.
          const moving = mode === 'all' ? ctx.doc.horizons.filter((h) => regionals[h.id]).map((h) => h.id) : [hit.horizonId];
          return {
            next: { name: 'dragging', mode, horizonId: hit.horizonId, index: hit.index, start: e.p, origin },
            commands: [{ type: 'select', horizonId: hit.horizonId }, { type: 'beginGesture', regionals: moving }],
          };
        }
        const id = ctx.selectedHorizonId;
        if (!id || !ctx.doc.horizons.some((h) => h.id === id)) return { commands: [{ type: 'message', kind: 'info', text: 'Select a horizon in the list, then click the points of its regional.' }] };
        if (activeScenario(ctx.doc).regionals[id]) return { commands: [{ type: 'message', kind: 'info', text: 'This horizon has a regional: drag its handles or its line, or clear it in the list.' }] };
        const placing = { name: 'placing' as const, horizonId: id, points: [e.p] };
        return { next: placing, commands: [preview(placing, null, ctx)] };
      },
      cancel: () => ({ commands: [{ type: 'preview', preview: null }] }),
    },
    placing: {
      pointerDown: (s, e, ctx) => {
        if (e.button !== 0) return {};
        if (e.clicks >= 2) return finish(s);
        const next = { ...s, points: [...s.points, e.p] };
        return { next, commands: [preview(next, null, ctx)] };
      },
      pointerMove: (s, e, ctx) => ({ commands: [preview(s, e.p, ctx)] }),
      key: (s, e, ctx) => {
        if (e.key === 'Enter') return finish(s);
        if (e.key === 'Backspace' || e.key === 'Delete') {
          if (s.points.length <= 1) return { next: idle, commands: [{ type: 'preview', preview: null }] };
          const next = { ...s, points: s.points.slice(0, -1) };
          return { next, commands: [preview(next, null, ctx)] };
        }
        return {};
      },
      cancel: () => ({ next: idle, commands: [{ type: 'preview', preview: null }] }),
    },
    dragging: {
      pointerMove: (s, e, ctx) => ({ commands: [{ type: 'gestureEdit', edit: dragEdit(s, e.p, ctx) }] }),
      pointerUp: (s, e, ctx) => ({ next: idle, commands: [{ type: 'gestureEdit', edit: dragEdit(s, e.p, ctx) }, { type: 'endGesture' }] }),
      cancel: () => ({ next: idle, commands: [{ type: 'cancelGesture' }] }),
    },
  },
};

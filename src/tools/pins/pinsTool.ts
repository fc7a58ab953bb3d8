// Place the two pins with two clicks, then drag either one sideways. A pin is the vertical section
// line through its point, so picking compares section x (in the calibrated frame), not pixels.
import { imageToSection } from '../../core/calibration/mapPoints';
import { setPins } from '../../core/model/commands/setPins';
import { activeScenario } from '../../core/model/docToSection';
import type { ImagePx } from '../../core/model/projectDoc';
import type { Tool, ToolContext } from '../toolTypes';

export type PinsState = { name: 'idle' } | { name: 'placing'; first: ImagePx } | { name: 'dragging'; index: 0 | 1; start: ImagePx; origin: ImagePx };

const idle: PinsState = { name: 'idle' };

function sectionX(ctx: ToolContext, p: ImagePx): number {
  return imageToSection(ctx.frame, p)[0];
}

/** Returns the pin (0 or 1) whose line is within the tolerance of p, or -1. */
export function pinUnder(ctx: ToolContext, p: ImagePx): -1 | 0 | 1 {
  const pins = activeScenario(ctx.doc).pinsPx;
  if (!pins) return -1;
  const x = sectionX(ctx, p);
  const tol = ctx.tolerancePx * ctx.frame.unitsPerPxX;
  const d = pins.map((q) => Math.abs(sectionX(ctx, q) - x));
  const i = d[0] <= d[1] ? 0 : 1;
  return d[i] <= tol ? i : -1;
}

export const pinsTool: Tool<PinsState> = {
  id: 'pins',
  initial: idle,
  states: {
    idle: {
      pointerDown: (_s, e, ctx) => {
        if (e.button !== 0) return {};
        const pins = activeScenario(ctx.doc).pinsPx;
        if (!pins) return { next: { name: 'placing', first: e.p }, commands: [{ type: 'preview', preview: { pinXs: [sectionX(ctx, e.p)] } }] };
        const i = pinUnder(ctx, e.p);
        if (i === -1) return { commands: [{ type: 'message', kind: 'info', text: 'Drag a pin sideways to move it, or type its x in the Pins panel.' }] };
        return { next: { name: 'dragging', index: i, start: e.p, origin: pins[i] }, commands: [{ type: 'beginGesture' }] };
      },
      cancel: () => ({ commands: [{ type: 'preview', preview: null }] }),
    },
    placing: {
      pointerMove: (s, e, ctx) => ({ commands: [{ type: 'preview', preview: { pinXs: [sectionX(ctx, s.first), sectionX(ctx, e.p)] } }] }),
      pointerDown: (s, e, ctx) => {
        if (e.button !== 0) return {};
        if (Math.abs(sectionX(ctx, e.p) - sectionX(ctx, s.first)) <= ctx.tolerancePx * ctx.frame.unitsPerPxX) return {};
        const pair: [ImagePx, ImagePx] = sectionX(ctx, s.first) <= sectionX(ctx, e.p) ? [s.first, e.p] : [e.p, s.first];
        return { next: idle, commands: [{ type: 'preview', preview: null }, { type: 'edit', edit: (d) => setPins(d, pair) }] };
      },
      cancel: () => ({ next: idle, commands: [{ type: 'preview', preview: null }] }),
    },
    dragging: {
      pointerMove: (s, e, ctx) => {
        const moved: ImagePx = [s.origin[0] + e.p[0] - s.start[0], s.origin[1] + e.p[1] - s.start[1]];
        const pins = activeScenario(ctx.doc).pinsPx;
        if (!pins || (e.p[0] === s.start[0] && e.p[1] === s.start[1])) return {};
        return { commands: [{ type: 'gestureEdit', edit: (d) => {
          const current = activeScenario(d).pinsPx;
          if (!current) return d;
          const pair: [ImagePx, ImagePx] = s.index === 0 ? [moved, current[1]] : [current[0], moved];
          return setPins(d, pair);
        } }] };
      },
      pointerUp: () => ({ next: idle, commands: [{ type: 'endGesture' }] }),
      cancel: () => ({ next: idle, commands: [{ type: 'cancelGesture' }] }),
    },
  },
};

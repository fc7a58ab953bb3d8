// The default tool: click a horizon line to select it; nothing is edited.
import { hitHorizon } from '../horizonHits';
import type { Tool } from '../toolTypes';

export type SelectState = { name: 'idle' };

export const selectTool: Tool<SelectState> = {
  id: 'select',
  initial: { name: 'idle' },
  states: {
    idle: {
      pointerDown: (_s, e, ctx) => {
        if (e.button !== 0) return {};
        const hit = hitHorizon(ctx.doc, ctx.selectedHorizonId, e.p, ctx.tolerancePx);
        return { commands: [{ type: 'select', horizonId: hit ? hit.horizon.id : null }] };
      },
      cancel: () => ({}),
    },
  },
};

// Draw a horizon by clicking anchors. While following the line (the default when a scan is shown) each
// anchor snaps to the line centre and the stretch from the previous anchor follows the drawn line (live
// preview to the pointer); Alt-click, or the hint's toggle, places a straight stretch. Double-click or
// Enter finishes, Backspace (or undo) removes the last stretch and redo puts it back, Esc cancels (after Enter it
// finishes with what is traced). Nothing reaches the document until the line is finished; then it arrives as one
// undo entry per stretch (the first adds the horizon with its first stretch, each next one extends it), so undo
// after finishing steps back stretch by stretch, exactly as it did while drawing, and redo forward again.
import { addHorizon, nextHorizonId } from '../../core/model/commands/addHorizon';
import { setHorizonPoints } from '../../core/model/commands/setHorizonPoints';
import type { ImagePx, ProjectDoc } from '../../core/model/projectDoc';
import { paletteColour } from '../../core/model/horizonPalette';
import type { Tool, ToolCommand, ToolContext, ToolResult } from '../toolTypes';
import { addAnchor, computing, hoverStretch, lineVertices, removeLastStretch, resolveStretches, startLine, type Stretch, type TracedLine } from '../tracedLine';

export type DrawHorizonState =
  | { name: 'idle' }
  | {
    name: 'placing';
    /** The anchors clicked (snapped to the line centre when following). */
    points: ImagePx[];
    stretches: Stretch[];
    hover: ImagePx | null;
    hoverAlt: boolean;
    /** The last ready traced preview to the pointer, shown while the next computes. */
    hoverPath: ImagePx[] | null;
    /** Finish asked while a stretch was still computing: finish when it is ready. */
    finishing: boolean;
    /** Stretches taken back by undo or Backspace, last taken first, for redo; emptied by a new anchor. */
    undone?: { anchor: ImagePx; stretch: Stretch }[];
  };

type Placing = Extract<DrawHorizonState, { name: 'placing' }>;

const idle: DrawHorizonState = { name: 'idle' };

const lineOf = (s: Placing): TracedLine => ({ anchors: s.points, stretches: s.stretches });

function withLine(s: Placing, line: TracedLine): Placing {
  return { ...s, points: line.anchors, stretches: line.stretches };
}

function preview(s: Placing, ctx: ToolContext): { state: Placing; command: ToolCommand } {
  const line = lineOf(s);
  const vertices = lineVertices(line);
  let hoverPath = s.hoverPath;
  if (s.hover && !s.finishing) {
    const h = hoverStretch(line, s.hover, ctx, s.hoverAlt, s.hoverPath);
    hoverPath = h.exact;
    for (let k = 1; k < h.preview.length; k++) vertices.push(h.preview[k]);
  }
  return { state: { ...s, hoverPath }, command: { type: 'preview', preview: { line: vertices, marks: s.points, colour: paletteColour(ctx.doc.horizons.length) } } };
}

function show(s: Placing, ctx: ToolContext, extra: ToolCommand[] = []): ToolResult<DrawHorizonState> {
  const p = preview(s, ctx);
  return { next: p.state, commands: [p.command, ...extra] };
}

/** Returns the vertices of the line's first k stretches. */
const firstStretches = (line: TracedLine, k: number): ImagePx[] => lineVertices({ anchors: line.anchors.slice(0, k + 1), stretches: line.stretches.slice(0, k) });

/** Adds the line to the document, one edit (one undo entry) per stretch. */
function finish(line: TracedLine, doc: ProjectDoc): ToolResult<DrawHorizonState> {
  if (line.anchors.length < 2) {
    return { next: idle, commands: [{ type: 'preview', preview: null }, { type: 'message', kind: 'info', text: 'A horizon needs at least two vertices.' }] };
  }
  const id = nextHorizonId(doc);
  // Named by addHorizon from the document it is added to: the next "Horizon N" that no horizon has.
  const horizon = { id, colour: paletteColour(doc.horizons.length), pointsPx: firstStretches(line, 1) };
  const edits: ToolCommand[] = [{ type: 'edit', edit: (d) => addHorizon(d, horizon) }];
  for (let k = 2; k <= line.stretches.length; k++) {
    const points = firstStretches(line, k);
    edits.push({ type: 'edit', edit: (d) => setHorizonPoints(d, id, points) });
  }
  return { next: idle, commands: [{ type: 'preview', preview: null }, ...edits, { type: 'select', horizonId: id }] };
}

/** Finishes at once: stretches still tracing are taken straight between their anchors, and the user is told. */
function finishNow(s: Placing, ctx: ToolContext): ToolResult<DrawHorizonState> {
  const done = finish(resolveStretches(lineOf(s), ctx), ctx.doc);
  const note: ToolCommand = { type: 'message', kind: 'info', text: 'Horizon finished: stretches still tracing were drawn straight between their clicks.' };
  return { ...done, commands: [...(done.commands ?? []), note] };
}

/** Finishes now, or once the traced stretches still computing are ready. */
function finishWhenReady(s: Placing, ctx: ToolContext): ToolResult<DrawHorizonState> {
  const line = resolveStretches(lineOf(s), ctx);
  if (!computing(line)) {
    const done = finish(line, ctx.doc);
    // Take down the note shown while waiting.
    return s.finishing ? { ...done, commands: [...(done.commands ?? []), { type: 'clearMessage' }] } : done;
  }
  return show({ ...withLine(s, line), finishing: true }, ctx, [{ type: 'message', kind: 'info', text: 'Tracing the last stretch…' }]);
}

export const drawHorizonTool: Tool<DrawHorizonState> = {
  id: 'draw',
  initial: idle,
  states: {
    idle: {
      pointerDown: (_s, e, ctx) => {
        if (e.button !== 0) return {};
        const line = startLine(e.p, ctx, e.alt);
        return show({ name: 'placing', points: line.anchors, stretches: [], hover: null, hoverAlt: false, hoverPath: null, finishing: false }, ctx);
      },
      cancel: () => ({ commands: [{ type: 'preview', preview: null }] }),
    },
    placing: {
      pointerDown: (s, e, ctx) => {
        if (e.button !== 0) return {};
        if (s.finishing) {
          // Finishing was asked and the user has moved on to the next line before the last stretch was traced:
          // keep this line as far as it is traced, and start the next one at this click.
          const done = finishNow(s, ctx);
          const line = startLine(e.p, ctx, e.alt);
          const started = show({ name: 'placing', points: line.anchors, stretches: [], hover: null, hoverAlt: false, hoverPath: null, finishing: false }, ctx);
          return { next: started.next, commands: [...(done.commands ?? []), ...(started.commands ?? [])] };
        }
        // The second press of a double-click lands on the vertex the first press placed: finish instead.
        if (e.clicks >= 2) return finishWhenReady(s, ctx);
        const line = addAnchor(resolveStretches(lineOf(s), ctx), e.p, ctx, e.alt);
        if (!line) return {};
        return show({ ...withLine(s, line), hover: null, hoverPath: null, undone: [] }, ctx);
      },
      pointerMove: (s, e, ctx) => show({ ...withLine(s, resolveStretches(lineOf(s), ctx)), hover: e.p, hoverAlt: e.alt ?? false }, ctx),
      traced: (s, _e, ctx) => {
        if (s.finishing) return finishWhenReady(s, ctx);
        return show(withLine(s, resolveStretches(lineOf(s), ctx)), ctx);
      },
      key: (s, e, ctx) => {
        if (e.key === 'Enter') return finishWhenReady(s, ctx);
        if (e.key === 'Backspace' || e.key === 'Delete' || e.key === 'Undo') {
          const full = lineOf(s);
          const line = removeLastStretch(full);
          if (!line) return { next: idle, commands: [{ type: 'preview', preview: null }] };
          const taken = { anchor: full.anchors[full.anchors.length - 1], stretch: full.stretches[full.stretches.length - 1] };
          return show({ ...withLine(s, line), hoverPath: null, finishing: false, undone: [...(s.undone ?? []), taken] }, ctx);
        }
        if (e.key === 'Redo') {
          const undone = s.undone ?? [];
          const back = undone[undone.length - 1];
          if (!back) return {};
          const line = { anchors: [...s.points, back.anchor], stretches: [...s.stretches, back.stretch] };
          return show({ ...withLine(s, line), hoverPath: null, undone: undone.slice(0, -1) }, ctx);
        }
        return {};
      },
      // Once finishing was asked (Enter, double-click), a tool switch or lost focus keeps the line: the stretches
      // still tracing are taken straight between their anchors, and the user is told. Before that, cancel drops it.
      cancel: (s, _e, ctx) => (s.finishing ? finishNow(s, ctx) : { next: idle, commands: [{ type: 'preview', preview: null }] }),
    },
  },
};

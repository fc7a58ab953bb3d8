// Draw a line by clicking anchors (a horizon, or a fault). While following the line (the default when a
// scan is shown) each anchor snaps to the line centre and the stretch from the previous anchor follows
// the drawn line (live preview to the pointer); Alt-click, or the hint's toggle, places a straight
// stretch. Double-click or Enter finishes, Backspace (or undo) removes the last stretch and redo puts it
// back, Esc cancels (after Enter it finishes with what is traced). Nothing reaches the document until the
// line is finished; then it arrives as one undo entry per stretch (the first adds the line with its first
// stretch, each next one extends it), so undo after finishing steps back stretch by stretch.
//
// A horizon may be drawn in pieces (docs/method.md §Faults and horizons in pieces): a click within a few
// screen pixels of a fault lands exactly on the fault and ends the piece there (its cutoff); the next
// click starts the next piece on the same fault (projected onto it, wherever it lands) and drawing goes on.
// The finished horizon is one line of vertices with a join where each new piece starts.
import type { ImagePx, ProjectDoc } from '../../core/model/projectDoc';
import { keepOnFault, snapToFault } from '../faultHits';
import type { Tool, ToolCommand, ToolContext, ToolResult } from '../toolTypes';
import { addAnchor, computing, hoverStretch, lineVertices, removeLastStretch, resolveStretches, startLine, type Stretch, type TracedLine } from '../tracedLine';

/** A piece drawn and ended on a fault: its anchors and stretches, and the fault its last anchor lies on. */
export interface EndedPiece { line: TracedLine; faultId: string }

/** Where each new piece starts along the finished line's vertices, and on which fault. */
export interface LineJoin { at: number; faultId: string }

/** The line as far as one stretch: its vertices and the joins among them. */
export interface LineStep { pointsPx: ImagePx[]; joins: LineJoin[] }

/** Returns the vertices of the line's first k stretches. */
const firstStretches = (line: TracedLine, k: number): ImagePx[] => lineVertices({ anchors: line.anchors.slice(0, k + 1), stretches: line.stretches.slice(0, k) });

/**
 * Returns the line after each of its stretches in order, across its pieces (a piece of one anchor is left out):
 * undo after finishing steps back stretch by stretch as it did while drawing.
 */
export function lineSteps(lines: TracedLine[], pieces: EndedPiece[]): LineStep[] {
  const steps: LineStep[] = [];
  let before: ImagePx[] = [];
  let joins: LineJoin[] = [];
  lines.forEach((line, k) => {
    if (line.stretches.length === 0) return;
    if (k > 0 && before.length > 0) joins = [...joins, { at: before.length, faultId: pieces[k - 1].faultId }];
    for (let s = 1; s <= line.stretches.length; s++) steps.push({ pointsPx: [...before, ...firstStretches(line, s)], joins });
    before = steps[steps.length - 1].pointsPx;
  });
  return steps;
}

export type DrawLineState =
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
    /** The pieces before this one, each ended on a fault (empty for a line in one piece). */
    pieces: EndedPiece[];
    /** Stretches taken back by undo or Backspace, last taken first, for redo; emptied by a new anchor. */
    undone?: { anchor: ImagePx; stretch: Stretch }[];
  }
  /** A piece has just ended on a fault: the next click starts the next piece on it. */
  | { name: 'continuing'; pieces: EndedPiece[]; hover: ImagePx | null; finishing: boolean };

type Placing = Extract<DrawLineState, { name: 'placing' }>;
type Continuing = Extract<DrawLineState, { name: 'continuing' }>;

export interface DrawLineSpec {
  id: string;
  /** The preview's colour for the next line of this kind in the document. */
  colour: (doc: ProjectDoc) => string;
  /** Whether a click near a fault ends a piece (horizons) or not (faults). */
  inPieces: boolean;
  /**
   * The commands that add the finished line as one undo entry per stretch: `steps` are the line after its first
   * stretch, its first two, … (each ≥ 2 vertices; joins empty unless drawn in pieces), the last the whole line.
   */
  add: (steps: LineStep[], doc: ProjectDoc) => ToolCommand[];
  /** What is drawn, for messages ("horizon", "fault"). */
  noun: string;
}

const idle: DrawLineState = { name: 'idle' };
const clear: ToolCommand = { type: 'preview', preview: null };

const lineOf = (s: Placing): TracedLine => ({ anchors: s.points, stretches: s.stretches });
const withLine = (s: Placing, line: TracedLine): Placing => ({ ...s, points: line.anchors, stretches: line.stretches });
const placing = (line: TracedLine, pieces: EndedPiece[]): Placing => ({ name: 'placing', points: line.anchors, stretches: line.stretches, hover: null, hoverAlt: false, hoverPath: null, finishing: false, pieces });

/** Every piece's line in order (the one being drawn last). */
function linesOf(s: Placing | Continuing): TracedLine[] {
  const lines = s.pieces.map((p) => p.line);
  if (s.name === 'placing') lines.push(lineOf(s));
  return lines;
}

function resolvePieces(pieces: EndedPiece[], ctx: ToolContext): EndedPiece[] {
  let changed = false;
  const out = pieces.map((p) => {
    const line = resolveStretches(p.line, ctx);
    if (line !== p.line) changed = true;
    return line === p.line ? p : { ...p, line };
  });
  return changed ? out : pieces;
}

function resolved<S extends Placing | Continuing>(s: S, ctx: ToolContext): S {
  const pieces = resolvePieces(s.pieces, ctx);
  const next = pieces === s.pieces ? s : { ...s, pieces };
  return next.name === 'placing' ? (withLine(next as Placing, resolveStretches(lineOf(next as Placing), ctx)) as S) : next;
}

function faultPoints(doc: ProjectDoc, id: string): ImagePx[] | null {
  return doc.faults.find((f) => f.id === id)?.pointsPx ?? null;
}

/** The ends of the pieces drawn so far (the cutoffs), marked in the preview. */
const cutoffMarks = (pieces: EndedPiece[]): ImagePx[] => pieces.map((p) => p.line.anchors[p.line.anchors.length - 1]);

export function drawLineTool(spec: DrawLineSpec): Tool<DrawLineState> {
  function preview(s: Placing | Continuing, ctx: ToolContext): { state: Placing | Continuing; command: ToolCommand } {
    const colour = spec.colour(ctx.doc);
    const lines = s.pieces.map((p) => lineVertices(p.line));
    const marks = cutoffMarks(s.pieces);
    if (s.name === 'continuing') {
      const fault = faultPoints(ctx.doc, s.pieces[s.pieces.length - 1].faultId);
      if (s.hover && fault) marks.push(keepOnFault(fault, s.hover));
      return { state: s, command: { type: 'preview', preview: { lines, marks, colour } } };
    }
    const line = lineOf(s);
    const vertices = lineVertices(line);
    let hoverPath = s.hoverPath;
    let tracing = computing(line);
    if (s.hover && !s.finishing) {
      const h = hoverStretch(line, s.hover, ctx, s.hoverAlt, s.hoverPath);
      hoverPath = h.exact;
      tracing ||= h.tracing;
      for (let k = 1; k < h.preview.length; k++) vertices.push(h.preview[k]);
      const snap = spec.inPieces && line.anchors.length >= 1 ? snapToFault(ctx.doc.faults, s.hover, ctx.tolerancePx) : null;
      if (snap) marks.push(snap.point);
    }
    lines.push(vertices);
    return { state: { ...s, hoverPath }, command: { type: 'preview', preview: { lines, line: vertices, marks: [...marks, ...s.points], colour, tracing } } };
  }

  function show(s: Placing | Continuing, ctx: ToolContext, extra: ToolCommand[] = []): ToolResult<DrawLineState> {
    const p = preview(s, ctx);
    return { next: p.state, commands: [p.command, ...extra] };
  }

  /** Adds the line from its pieces (stretches still computing taken straight), one undo entry per stretch. */
  function finish(lines: TracedLine[], pieces: EndedPiece[], doc: ProjectDoc): ToolResult<DrawLineState> {
    const steps = lineSteps(lines, pieces);
    if (steps.length === 0) {
      return { next: idle, commands: [clear, { type: 'message', kind: 'info', text: `A ${spec.noun} needs at least two vertices.` }] };
    }
    return { next: idle, commands: [clear, ...spec.add(steps, doc)] };
  }

  /** Finishes at once: stretches still tracing are taken straight between their anchors, and the user is told. */
  function finishNow(s: Placing | Continuing, ctx: ToolContext): ToolResult<DrawLineState> {
    const r = resolved(s, ctx);
    const done = finish(linesOf(r), r.pieces, ctx.doc);
    const note: ToolCommand = { type: 'message', kind: 'info', text: `${spec.noun[0].toUpperCase()}${spec.noun.slice(1)} finished: stretches still tracing were drawn straight between their clicks.` };
    return { ...done, commands: [...(done.commands ?? []), note] };
  }

  /** Finishes now, or once the traced stretches still computing are ready. */
  function finishWhenReady(s: Placing | Continuing, ctx: ToolContext): ToolResult<DrawLineState> {
    const r = resolved(s, ctx);
    const lines = linesOf(r);
    if (!lines.some(computing)) {
      const done = finish(lines, r.pieces, ctx.doc);
      // Take down the note shown while waiting.
      return s.finishing ? { ...done, commands: [...(done.commands ?? []), { type: 'clearMessage' }] } : done;
    }
    return show({ ...r, finishing: true }, ctx, [{ type: 'message', kind: 'info', text: 'Tracing the last stretch…' }]);
  }

  /** Ends the piece being drawn at `point` on fault `faultId` (the anchor lands exactly there). */
  function endPiece(s: Placing, point: ImagePx, faultId: string, alt: boolean, ctx: ToolContext): ToolResult<DrawLineState> {
    const line = addAnchor(resolveStretches(lineOf(s), ctx), point, ctx, alt, true) ?? lineOf(s);
    if (line.anchors.length < 2) return {};
    return show({ name: 'continuing', pieces: [...s.pieces, { line, faultId }], hover: null, finishing: false }, ctx);
  }

  /** The last piece ended back as the one being drawn, without its last stretch (the click that ended it). */
  function reopen(s: Continuing, ctx: ToolContext): ToolResult<DrawLineState> {
    const last = s.pieces[s.pieces.length - 1];
    const line = removeLastStretch(last.line);
    if (!line) return { next: idle, commands: [clear] };
    return show(placing(line, s.pieces.slice(0, -1)), ctx);
  }

  return {
    id: spec.id,
    initial: idle,
    states: {
      idle: {
        pointerDown: (_s, e, ctx) => {
          if (e.button !== 0) return {};
          return show(placing(startLine(e.p, ctx, e.alt), []), ctx);
        },
        cancel: () => ({ commands: [clear] }),
      },
      placing: {
        pointerDown: (s, e, ctx) => {
          if (e.button !== 0) return {};
          if (s.finishing) {
            // Finishing was asked and the user has moved on to the next line before the last stretch was traced:
            // keep this line as far as it is traced, and start the next one at this click.
            const done = finishNow(s, ctx);
            const started = show(placing(startLine(e.p, ctx, e.alt), []), ctx);
            return { next: started.next, commands: [...(done.commands ?? []), ...(started.commands ?? [])] };
          }
          // The second press of a double-click lands on the vertex the first press placed: finish instead.
          if (e.clicks >= 2) return finishWhenReady(s, ctx);
          const snap = spec.inPieces ? snapToFault(ctx.doc.faults, e.p, ctx.tolerancePx) : null;
          // A piece that has just started on a fault does not end on it at once (the next click near it goes on drawing).
          const startedOn = s.pieces.length > 0 && s.points.length === 1 ? s.pieces[s.pieces.length - 1].faultId : null;
          if (snap && snap.faultId !== startedOn) return endPiece(s, snap.point, snap.faultId, e.alt, ctx);
          const line = addAnchor(resolveStretches(lineOf(s), ctx), e.p, ctx, e.alt);
          if (!line) return {};
          return show({ ...withLine(s, line), hover: null, hoverPath: null, undone: [] }, ctx);
        },
        pointerMove: (s, e, ctx) => show({ ...resolved(s, ctx), hover: e.p, hoverAlt: e.alt ?? false }, ctx),
        traced: (s, _e, ctx) => (s.finishing ? finishWhenReady(s, ctx) : show(resolved(s, ctx), ctx)),
        key: (s, e, ctx) => {
          if (e.key === 'Enter') return finishWhenReady(s, ctx);
          if (e.key === 'Backspace' || e.key === 'Delete' || e.key === 'Undo') {
            // The first anchor of a piece started on a fault: back to waiting for that piece's first click.
            if (s.points.length === 1 && s.pieces.length > 0) return show({ name: 'continuing', pieces: s.pieces, hover: s.hover, finishing: false }, ctx);
            const full = lineOf(s);
            const line = removeLastStretch(full);
            if (!line) return { next: idle, commands: [clear] };
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
        cancel: (s, _e, ctx) => (s.finishing ? finishNow(s, ctx) : { next: idle, commands: [clear] }),
      },
      continuing: {
        pointerDown: (s, e, ctx) => {
          if (e.button !== 0) return {};
          if (e.clicks >= 2 || s.finishing) return finishWhenReady(s, ctx);
          const fault = faultPoints(ctx.doc, s.pieces[s.pieces.length - 1].faultId);
          if (!fault) return finishWhenReady(s, ctx);
          return show(placing(startLine(keepOnFault(fault, e.p), ctx, e.alt, true), s.pieces), ctx);
        },
        pointerMove: (s, e, ctx) => show({ ...resolved(s, ctx), hover: e.p }, ctx),
        traced: (s, _e, ctx) => (s.finishing ? finishWhenReady(s, ctx) : show(resolved(s, ctx), ctx)),
        key: (s, e, ctx) => {
          if (e.key === 'Enter') return finishWhenReady(s, ctx);
          if (e.key === 'Backspace' || e.key === 'Delete' || e.key === 'Undo') return reopen(s, ctx);
          return {};
        },
        cancel: (s, _e, ctx) => (s.finishing ? finishNow(s, ctx) : { next: idle, commands: [clear] }),
      },
    },
  };
}

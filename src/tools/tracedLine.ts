// A line being drawn by anchor clicks, shared by the drawing tools: between consecutive anchors a
// stretch either follows the drawn line on the scan (the tracer's least-cost path, centred on the ink)
// or runs straight. Anchors snap to the line centre while following. A traced stretch may still be
// computing when its anchor is placed; it is filled in when the tracer announces it.
import type { ImagePx } from '../core/model/projectDoc';
import type { ToolContext } from './toolTypes';

/** One stretch, from anchor i to anchor i + 1: straight, or traced (points null while the tracer computes). */
export interface Stretch { straight: boolean; points: ImagePx[] | null }

export interface TracedLine { anchors: ImagePx[]; stretches: Stretch[] }

/** Returns whether a click or hover with Alt held (`alt`) follows the line in this context. */
export function follows(ctx: ToolContext, alt: boolean): boolean {
  return !!ctx.tracer && (ctx.followLine ?? true) !== alt;
}

/** Returns the point moved to the line centre when following, else as given. */
export function snapped(p: ImagePx, ctx: ToolContext, alt: boolean): ImagePx {
  if (!follows(ctx, alt)) return p;
  return ctx.tracer?.snap(p, ctx.tolerancePx) ?? p;
}

/** Returns a line of one anchor at p (snapped when following, unless `exact`: a point already placed on a fault). */
export function startLine(p: ImagePx, ctx: ToolContext, alt: boolean, exact = false): TracedLine {
  return { anchors: [exact ? p : snapped(p, ctx, alt)], stretches: [] };
}

/**
 * Returns the line with an anchor added at p and the stretch to it (traced when following); null when p is the last
 * anchor. With `exact` the anchor is p itself (a piece end snapped onto a fault), the stretch still traced to it.
 */
export function addAnchor(line: TracedLine, p: ImagePx, ctx: ToolContext, alt: boolean, exact = false): TracedLine | null {
  const q = exact ? p : snapped(p, ctx, alt);
  const last = line.anchors[line.anchors.length - 1];
  if (Math.hypot(last[0] - q[0], last[1] - q[1]) < 1e-9) return null;
  const straight = !follows(ctx, alt);
  const points = straight ? null : (ctx.tracer?.stretch(last, q, true) ?? null);
  return { anchors: [...line.anchors, q], stretches: [...line.stretches, { straight, points }] };
}

/** Returns the line with traced stretches that were computing filled in where the tracer has them (the same line when none changed). */
export function resolveStretches(line: TracedLine, ctx: ToolContext): TracedLine {
  let changed = false;
  const stretches = line.stretches.map((s, i) => {
    if (s.straight || s.points || !ctx.tracer) return s;
    const points = ctx.tracer.stretch(line.anchors[i], line.anchors[i + 1], true);
    if (!points) return s;
    changed = true;
    return { straight: false, points };
  });
  return changed ? { anchors: line.anchors, stretches } : line;
}

/** Returns true while a traced stretch is still computing. */
export function computing(line: TracedLine): boolean {
  return line.stretches.some((s) => !s.straight && !s.points);
}

/** Returns the line's vertices: the anchors joined by their stretches (a computing stretch counts as straight for now). */
export function lineVertices(line: TracedLine): ImagePx[] {
  const out: ImagePx[] = [line.anchors[0]];
  line.stretches.forEach((s, i) => {
    const pts = s.points;
    if (pts && pts.length >= 2) for (let k = 1; k < pts.length; k++) out.push(pts[k]);
    else out.push(line.anchors[i + 1]);
  });
  return out;
}

/** Returns the line without its last anchor and stretch; null when only the first anchor was left. */
export function removeLastStretch(line: TracedLine): TracedLine | null {
  if (line.anchors.length <= 1) return null;
  return { anchors: line.anchors.slice(0, -1), stretches: line.stretches.slice(0, -1) };
}

/**
 * Returns the preview from the last anchor to the pointer: the traced stretch when ready; while it computes, the last
 * ready one (`previous`, if it starts at the same anchor) then on to the pointer; a straight segment otherwise.
 * `exact` is the ready stretch to keep as the next `previous`; `tracing` says the preview is a stand-in (straight, the
 * last one extended, or a rough trace) for the full-resolution trace still computing.
 */
export function hoverStretch(line: TracedLine, p: ImagePx, ctx: ToolContext, alt: boolean, previous: ImagePx[] | null): { preview: ImagePx[]; exact: ImagePx[] | null; tracing: boolean } {
  const last = line.anchors[line.anchors.length - 1];
  if (!follows(ctx, alt)) return { preview: [last, p], exact: null, tracing: false };
  const q = snapped(p, ctx, alt);
  const exact = ctx.tracer?.stretch(last, q) ?? null;
  if (exact) return { preview: exact, exact, tracing: ctx.tracer?.rough?.(exact) ?? false };
  if (previous && previous.length > 0 && previous[0][0] === last[0] && previous[0][1] === last[1]) return { preview: [...previous, q], exact: previous, tracing: true };
  return { preview: [last, q], exact: null, tracing: true };
}

// The new viewport a nested <svg> element establishes (SVG 1.1 §7.9): its x, y, width and height place it
// in the parent's user space, and its viewBox with preserveAspectRatio (§7.7, §7.8) maps its own user space
// into that rectangle. Lengths are user units ("px" allowed), a percentage of the parent viewport (§7.10),
// or an absolute unit at 96 CSS px per inch (CSS Values and Units 3 §6.2, which browsers draw with).
import type { Matrix } from './svgTransform';

/** Width and height of a viewport in its own user units (what percentages inside it refer to). */
export interface ViewportSize { width: number; height: number }

export type NestedViewport =
  | { ok: true; matrix: Matrix; size: ViewportSize }
  /** A zero width, height or viewBox size: the element and its content are not drawn (§7.7, §7.9). */
  | { ok: true; hidden: true }
  | { ok: false; message: string };

const UNIT_PX: Record<string, number> = { '': 1, px: 1, in: 96, cm: 96 / 2.54, mm: 96 / 25.4, pt: 96 / 72, pc: 16 };

/** Returns a length attribute in user units (`reference` for percentages), `fallback` when absent, NaN when unreadable. */
export function svgLength(text: string | undefined, reference: number, fallback: number): number {
  if (text === undefined || text.trim() === '') return fallback;
  const m = /^\s*([+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)\s*(%|px|in|cm|mm|pt|pc)?\s*$/.exec(text);
  if (!m) return NaN;
  const v = Number(m[1]);
  return m[2] === '%' ? (v / 100) * reference : v * UNIT_PX[m[2] ?? ''];
}

/** Returns the viewBox [minX, minY, width, height], null when absent, NaN entries when unreadable. */
export function parseViewBox(text: string | undefined): [number, number, number, number] | null {
  if (text === undefined || text.trim() === '') return null;
  const v = text.trim().split(/[\s,]+/).map(Number);
  return v.length === 4 ? (v as [number, number, number, number]) : [NaN, NaN, NaN, NaN];
}

/** Returns the root element's viewport size in its user units: the viewBox size, else width and height, else 100 × 100. */
export function rootViewportSize(a: Record<string, string>): ViewportSize {
  const vb = parseViewBox(a.viewBox);
  if (vb && vb.every(Number.isFinite) && vb[2] > 0 && vb[3] > 0) return { width: vb[2], height: vb[3] };
  const w = svgLength(a.width, 100, 100);
  const h = svgLength(a.height, 100, 100);
  return { width: w > 0 ? w : 100, height: h > 0 ? h : 100 };
}

/** Returns the matrix from a nested <svg>'s user space to its parent's, and its viewport size; hidden when it is empty. */
export function nestedViewport(a: Record<string, string>, parent: ViewportSize): NestedViewport {
  // §7.9: x, y default to 0; width, height to 100% (of the parent viewport, §7.10).
  const x = svgLength(a.x, parent.width, 0);
  const y = svgLength(a.y, parent.height, 0);
  const width = svgLength(a.width, parent.width, parent.width);
  const height = svgLength(a.height, parent.height, parent.height);
  if (![x, y, width, height].every(Number.isFinite)) return { ok: false, message: 'has an x, y, width or height that cannot be read' };
  if (width < 0 || height < 0) return { ok: false, message: 'has a negative width or height' };
  if (width === 0 || height === 0) return { ok: true, hidden: true };
  const vb = parseViewBox(a.viewBox);
  if (!vb) return { ok: true, matrix: [1, 0, 0, 1, x, y], size: { width, height } };
  const [minX, minY, vbW, vbH] = vb;
  if (!vb.every(Number.isFinite) || vbW < 0 || vbH < 0) return { ok: false, message: 'has a viewBox that cannot be read' };
  if (vbW === 0 || vbH === 0) return { ok: true, hidden: true };
  // §7.8: preserveAspectRatio = [defer] <align> [meet | slice]; default xMidYMid meet.
  const par = (a.preserveAspectRatio ?? '').trim().split(/\s+/).filter((t) => t !== 'defer');
  const align = par[0] || 'xMidYMid';
  const slice = par[1] === 'slice';
  const aligns = /^x(Min|Mid|Max)Y(Min|Mid|Max)$/.exec(align);
  if (align !== 'none' && !aligns) return { ok: false, message: 'has a preserveAspectRatio that cannot be read' };
  let sx = width / vbW;
  let sy = height / vbH;
  if (aligns) sx = sy = slice ? Math.max(sx, sy) : Math.min(sx, sy);
  let tx = x - minX * sx;
  let ty = y - minY * sy;
  if (aligns) {
    const share: Record<string, number> = { Min: 0, Mid: 0.5, Max: 1 };
    tx += share[aligns[1]] * (width - vbW * sx);
    ty += share[aligns[2]] * (height - vbH * sy);
  }
  return { ok: true, matrix: [sx, 0, 0, sy, tx, ty], size: { width: vbW, height: vbH } };
}

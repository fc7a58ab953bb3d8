// Horizons drawn in a drafting program and saved as SVG: every drawn <path>, <polyline> and <line>,
// with the transforms of its groups and the viewports of nested <svg> elements, becomes a line in
// the drawing's root user units. Shapes that are only definitions (in <defs>, <symbol>, <clipPath>,
// <mask>, <marker> or <pattern>) are not drawn and not imported. Two points whose section
// coordinates the user knows then scale each axis (svgToSectionAxes).
// The SVG is read as text by a small tag scanner, never inserted into the page.
import type { ImportedHorizon } from '../core/model/commands/importHorizons';
import type { XZ } from '../core/model/section';
import { MAX_IMPORT_BYTES, pushProblem, type RowProblem } from './importTypes';
import { pathDataToPolylines, TOO_MANY_POINTS, type Pt } from './svgPathData';
import { LIMITS, countText, fileTooLargeMessage, tooManyMessage } from '../core/model/limits';
import { applyMatrix, IDENTITY, multiply, parseTransform, type Matrix } from './svgTransform';
import { nestedViewport, rootViewportSize, type ViewportSize } from './svgViewport';

export interface SvgLine { name: string; points: Pt[] }
export type SvgRead = { ok: true; lines: SvgLine[]; problems: RowProblem[] } | { ok: false; message: string; problems: RowProblem[] };

/** Two reference points: their position in the drawing (root user units) and in the section. */
export interface SvgReference { svg: Pt; section: XZ }

function decodeEntities(s: string): string {
  return s.replace(/&(#x[0-9a-f]+|#\d+|amp|lt|gt|quot|apos);/gi, (all, e: string) => {
    const k = e.toLowerCase();
    if (k === 'amp') return '&';
    if (k === 'lt') return '<';
    if (k === 'gt') return '>';
    if (k === 'quot') return '"';
    if (k === 'apos') return "'";
    const code = k.startsWith('#x') ? parseInt(k.slice(2), 16) : parseInt(k.slice(1), 10);
    return code > 0 && code <= 0x10ffff ? String.fromCodePoint(code) : all;
  });
}

function attributes(s: string): Record<string, string> {
  const out: Record<string, string> = Object.create(null);
  const re = /([A-Za-z_:][\w:.-]*)\s*=\s*(?:"([^"]*)"|'([^']*)')/g;
  let m: RegExpExecArray | null;
  while ((m = re.exec(s)) !== null) out[m[1]] = decodeEntities(m[2] ?? m[3] ?? '');
  return out;
}

function numberList(s: string | undefined): number[] {
  return (s ?? '').trim().split(/[\s,]+/).filter(Boolean).map(Number);
}

function shapeLines(tag: string, a: Record<string, string>, maxPoints: number): Pt[][] | null | typeof TOO_MANY_POINTS {
  if (tag === 'path') return pathDataToPolylines(a.d ?? '', maxPoints);
  if (tag === 'polyline' || tag === 'polygon') {
    const v = numberList(a.points);
    if (v.length < 4 || v.some((x) => !Number.isFinite(x))) return null;
    const pts: Pt[] = [];
    for (let i = 0; i + 1 < v.length; i += 2) pts.push([v[i], v[i + 1]]);
    if (tag === 'polygon') pts.push(pts[0]);
    return [pts];
  }
  const v = [a.x1, a.y1, a.x2, a.y2].map((x) => Number(x ?? 0));
  return v.every(Number.isFinite) ? [[[v[0], v[1]], [v[2], v[3]]]] : null;
}

/** What a group or <svg> element passes to its content: the matrix to root user units, the viewport percentages refer to, and whether it is drawn. */
interface Frame { ctm: Matrix; viewport: ViewportSize; hidden: boolean }

/** Elements that pass their content on to be drawn (with their transform or viewport). */
const DRAWN_CONTAINERS = new Set(['g', 'svg', 'a']);
/**
 * Elements whose content is never drawn where it stands, only when referenced: SVG 1.1 §5.3 ("elements that
 * are descendants of a 'defs' are not rendered directly") and §5.5 'symbol' ("never rendered directly");
 * likewise 'clipPath' (§14.3.5), 'mask' (§14.4), 'marker' (§11.6.2) and 'pattern' (§13.3) — those four
 * section numbers recalled from memory. Lower case, as tags are compared.
 */
const DEFINITION_CONTAINERS = new Set(['defs', 'symbol', 'clippath', 'mask', 'marker', 'pattern']);
/** Elements read as lines. */
const SHAPES = new Set(['path', 'polyline', 'polygon', 'line']);

/**
 * Returns every drawn path, polyline and line of an SVG text in root user units (group transforms and nested <svg>
 * viewports applied; the root's own viewBox is not, so the reference points are read in its user units), bad
 * ones listed; shapes that are only definitions are left out; never throws.
 */
export function readSvgLines(text: string): SvgRead {
  const problems: RowProblem[] = [];
  if (text.length > MAX_IMPORT_BYTES) return { ok: false, message: `The SVG file cannot be imported: ${fileTooLargeMessage(text.length, MAX_IMPORT_BYTES)}.`, problems };
  const body = text.replace(/<!--[\s\S]*?-->/g, '').replace(/<!\[CDATA\[[\s\S]*?\]\]>/g, '');
  if (!/<svg[\s>]/i.test(body)) return { ok: false, message: 'The file is not an SVG drawing (no <svg> element).', problems };
  const stack: Frame[] = [{ ctm: IDENTITY, viewport: { width: 100, height: 100 }, hidden: false }];
  let rootSeen = false;
  const lines: SvgLine[] = [];
  const counter = { n: 0 };
  let count = 0;
  let notDrawn = 0;
  let total = 0;
  const re = /<(\/?)([A-Za-z][\w:.-]*)((?:[^>"']|"[^"]*"|'[^']*')*?)(\/?)>/g;
  let m: RegExpExecArray | null;
  while ((m = re.exec(body)) !== null) {
    const [, closing, rawTag, attrText, selfClosing] = m;
    const tag = rawTag.replace(/^.*:/, '').toLowerCase();
    if (closing) {
      if ((DRAWN_CONTAINERS.has(tag) || DEFINITION_CONTAINERS.has(tag)) && stack.length > 1) stack.pop();
      continue;
    }
    const parent = stack[stack.length - 1];
    if (parent.hidden || DEFINITION_CONTAINERS.has(tag)) {
      // Nothing in here is drawn: keep track of the nesting, read nothing else.
      if ((DRAWN_CONTAINERS.has(tag) || DEFINITION_CONTAINERS.has(tag)) && !selfClosing) stack.push({ ...parent, hidden: true });
      else if (SHAPES.has(tag)) notDrawn += 1;
      continue;
    }
    const a = attributes(attrText);
    if (displayNone(a)) {
      // Not drawn, nor anything in it (SVG 1.1 §11.5, 'display': none; section number recalled from memory): a layer the author hid is not imported.
      if (DRAWN_CONTAINERS.has(tag) && !selfClosing) stack.push({ ...parent, hidden: true });
      else if (SHAPES.has(tag)) notDrawn += 1;
      continue;
    }
    const own = parseTransform(a.transform);
    const where = `<${tag}>${a.id ? ` "${a.id.slice(0, 60)}"` : ''}`;
    if (!own) pushProblem(problems, { where, message: 'has a transform that cannot be read; treated as none' }, counter);
    const ctm = multiply(parent.ctm, own ?? IDENTITY);
    if (DRAWN_CONTAINERS.has(tag) && !selfClosing) {
      stack.push(tag === 'svg' ? svgFrame(a, ctm, parent, !rootSeen, where, problems, counter) : { ...parent, ctm });
      rootSeen ||= tag === 'svg';
      continue;
    }
    if (tag === 'use') {
      // A copy of another element (SVG 1.1 §5.6): not followed, so say that what it draws is not imported.
      pushProblem(problems, { where, message: 'draws a copy of another element; copies are not imported' }, counter);
      continue;
    }
    if (!SHAPES.has(tag)) continue;
    count += 1;
    const parts = shapeLines(tag, a, LIMITS.totalPoints - total);
    if (parts === TOO_MANY_POINTS || lines.length > LIMITS.horizons) return tooMany(lines.length, problems);
    const label = (a['inkscape:label'] ?? a['data-name'] ?? a.id ?? `${tag} ${count}`).trim().slice(0, 500) || `${tag} ${count}`;
    if (!parts) { pushProblem(problems, { where, message: 'its geometry cannot be read' }, counter); continue; }
    parts.forEach((pts, k) => {
      const points = pts.map((p) => applyMatrix(ctm, p));
      if (points.length < 2 || points.some((p) => !Number.isFinite(p[0]) || !Number.isFinite(p[1]))) {
        pushProblem(problems, { where, message: 'has fewer than two usable points' }, counter);
      } else {
        lines.push({ name: parts.length > 1 ? `${label} ${k + 1}` : label, points });
        total += points.length;
      }
    });
    if (total > LIMITS.totalPoints) return tooMany(lines.length, problems);
  }
  let longest = 0;
  for (const l of lines) longest = Math.max(longest, l.points.length);
  if (lines.length > LIMITS.horizons) return tooMany(lines.length, problems);
  if (longest > LIMITS.pointsPerLine) return { ok: false, message: `The SVG file holds ${tooManyMessage('vertices in one line', longest, LIMITS.pointsPerLine)}; simplify the drawing or split the line.`, problems };
  if (lines.length === 0) {
    const why = notDrawn > 0 ? ` (${notDrawn} ${notDrawn === 1 ? 'shape is' : 'shapes are'} only definitions (in <defs> or the like), hidden, or in an empty viewport, and not drawn)` : '';
    return { ok: false, message: `The SVG file holds no drawn path, polyline or line to import${why}.`, problems };
  }
  return { ok: true, lines, problems };
}

function tooMany(lines: number, problems: RowProblem[]): SvgRead {
  const what = lines > LIMITS.horizons ? tooManyMessage('lines', lines, LIMITS.horizons) : `more than ${countText(LIMITS.totalPoints)} vertices, too many for the app (the limit is ${countText(LIMITS.totalPoints)})`;
  return { ok: false, message: `The SVG file holds ${what}; simplify the drawing (fewer curves and arcs) or import it in parts. Nothing was imported.`, problems };
}

/** True when the element's 'display' is none, as an attribute or in its style (the style wins, as CSS over a presentation attribute). */
function displayNone(a: Record<string, string>): boolean {
  const inStyle = /(?:^|;)\s*display\s*:\s*([^;!]+)/i.exec(a.style ?? '');
  const value = inStyle ? inStyle[1] : a.display;
  return value !== undefined && value.trim().toLowerCase() === 'none';
}

/** Returns the frame an <svg> element gives its content: the root keeps its user units; a nested one maps its viewport (SVG 1.1 §7.9). */
function svgFrame(a: Record<string, string>, ctm: Matrix, parent: Frame, isRoot: boolean, where: string, problems: RowProblem[], counter: { n: number }): Frame {
  if (isRoot) return { ctm, viewport: rootViewportSize(a), hidden: false };
  const vp = nestedViewport(a, parent.viewport);
  if (!vp.ok) {
    pushProblem(problems, { where, message: `${vp.message}; its content is skipped` }, counter);
    return { ...parent, hidden: true };
  }
  if ('hidden' in vp) {
    pushProblem(problems, { where, message: 'has a zero width, height or viewBox, so nothing in it is drawn; its content is skipped' }, counter);
    return { ...parent, hidden: true };
  }
  return { ctm: multiply(ctm, vp.matrix), viewport: vp.size, hidden: false };
}

/** Returns the map from the drawing's root user units to the section that the two reference points give (each axis scaled on its own), or a message when they share an x or a y. */
export function svgSectionMap(refs: [SvgReference, SvgReference]): { ok: true; map: (p: Pt) => XZ } | { ok: false; message: string } {
  const [p, q] = refs;
  const dsx = q.svg[0] - p.svg[0];
  const dsy = q.svg[1] - p.svg[1];
  if (![p.svg[0], p.svg[1], q.svg[0], q.svg[1], p.section[0], p.section[1], q.section[0], q.section[1]].every(Number.isFinite)) return { ok: false, message: 'Enter all eight numbers of the two reference points.' };
  if (dsx === 0 || dsy === 0) return { ok: false, message: 'The two reference points must differ both across and up the drawing.' };
  const kx = (q.section[0] - p.section[0]) / dsx;
  const kz = (q.section[1] - p.section[1]) / dsy;
  if (kx === 0 || kz === 0) return { ok: false, message: 'The two reference points must have different section x and different z.' };
  return { ok: true, map: ([sx, sy]: Pt): XZ => [p.section[0] + (sx - p.svg[0]) * kx, p.section[1] + (sy - p.svg[1]) * kz] };
}

/** Returns the lines in section units, scaling each axis through the two reference points, or a message when they share an x or a y. */
export function svgToSectionAxes(lines: SvgLine[], refs: [SvgReference, SvgReference]): { ok: true; horizons: ImportedHorizon[] } | { ok: false; message: string } {
  const m = svgSectionMap(refs);
  if (!m.ok) return m;
  return { ok: true, horizons: lines.map((l) => ({ name: l.name, line: l.points.map(m.map) })) };
}

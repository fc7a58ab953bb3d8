// Paints the section figure's SVG (the markup renderSectionSvg writes, and nothing else) onto a 2-D canvas,
// so that a PNG is drawn from the very description the SVG export holds — in a worker, where the browser
// cannot rasterise SVG. It reads the small part of SVG those renderers use: g, defs, clipPath, rect, line,
// polyline, polygon, circle, path (M L H V Z, either case), text (with paint-order="stroke" halos and
// translate/rotate transforms), title (skipped) and image (skipped: the scan is drawn by the caller). Painting
// follows SVG's rules where they differ from the canvas's: fill black and stroke none by default, miter limit 4,
// presentation attributes inherited by children, whitespace in text collapsed, clip paths in the user space of
// the element that uses them.

type Ctx = CanvasRenderingContext2D | OffscreenCanvasRenderingContext2D;

/** One element of the figure's markup. */
export interface SvgNode { tag: string; attrs: Record<string, string>; children: SvgNode[]; text: string }

const ENTITIES: Record<string, string> = { amp: '&', lt: '<', gt: '>', quot: '"', apos: "'" };

function decode(s: string): string {
  return s.replace(/&(#x[0-9a-f]+|#\d+|\w+);/gi, (m, e: string) => {
    if (e[0] === '#') return String.fromCodePoint(e[1] === 'x' || e[1] === 'X' ? parseInt(e.slice(2), 16) : parseInt(e.slice(1), 10));
    return ENTITIES[e] ?? m;
  });
}

/** Returns the element tree of an SVG document (well-formed markup with double-quoted attributes); throws on a tag that does not close. */
export function parseFigureSvg(svg: string): SvgNode {
  const root: SvgNode = { tag: '#root', attrs: {}, children: [], text: '' };
  const stack: SvgNode[] = [root];
  const token = /<(\/?)([A-Za-z][\w:.-]*)((?:\s+[\w:.-]+\s*=\s*"[^"]*")*)\s*(\/?)>|<!--[\s\S]*?-->|<\?[\s\S]*?\?>|([^<]+)/g;
  const attr = /([\w:.-]+)\s*=\s*"([^"]*)"/g;
  let m: RegExpExecArray | null;
  while ((m = token.exec(svg))) {
    const top = stack[stack.length - 1];
    if (m[5] !== undefined) { top.text += decode(m[5]); continue; }
    if (!m[2]) continue;
    if (m[1]) {
      if (top.tag !== m[2]) throw new Error(`The figure's markup closes <${m[2]}> inside <${top.tag}>.`);
      stack.pop();
      continue;
    }
    const node: SvgNode = { tag: m[2], attrs: {}, children: [], text: '' };
    for (const a of m[3].matchAll(attr)) node.attrs[a[1]] = decode(a[2]);
    top.children.push(node);
    if (!m[4]) stack.push(node);
  }
  if (stack.length !== 1) throw new Error(`The figure's markup leaves <${stack[stack.length - 1].tag}> open.`);
  const svgRoot = root.children.find((c) => c.tag === 'svg');
  if (!svgRoot) throw new Error('The figure has no <svg> element.');
  return svgRoot;
}

/** The presentation attributes SVG passes from a group to what it holds. */
const INHERITED = ['fill', 'stroke', 'stroke-width', 'fill-opacity', 'stroke-opacity', 'stroke-dasharray', 'stroke-linejoin', 'stroke-linecap',
  'font-size', 'font-family', 'font-weight', 'text-anchor', 'paint-order'] as const;
type Style = Record<(typeof INHERITED)[number], string>;
const INITIAL: Style = {
  fill: '#000000', stroke: 'none', 'stroke-width': '1', 'fill-opacity': '1', 'stroke-opacity': '1', 'stroke-dasharray': 'none',
  'stroke-linejoin': 'miter', 'stroke-linecap': 'butt', 'font-size': '16', 'font-family': 'sans-serif', 'font-weight': 'normal',
  'text-anchor': 'start', 'paint-order': 'normal',
};

const num = (s: string | undefined, fallback = 0) => {
  const v = s === undefined ? NaN : parseFloat(s);
  return Number.isFinite(v) ? v : fallback;
};
const numbers = (s: string) => (s.match(/[-+]?(?:\d+\.?\d*|\.\d+)(?:e[-+]?\d+)?/gi) ?? []).map(Number);

/** Applies an SVG transform list (matrix, translate, scale, rotate) to the context, left to right. */
function applyTransform(ctx: Ctx, t: string): void {
  for (const m of t.matchAll(/(matrix|translate|scale|rotate)\s*\(([^)]*)\)/g)) {
    const v = numbers(m[2]);
    if (m[1] === 'matrix' && v.length === 6) ctx.transform(v[0], v[1], v[2], v[3], v[4], v[5]);
    else if (m[1] === 'translate') ctx.translate(v[0] ?? 0, v[1] ?? 0);
    else if (m[1] === 'scale') ctx.scale(v[0] ?? 1, v[1] ?? v[0] ?? 1);
    else if (m[1] === 'rotate') {
      const [a, cx = 0, cy = 0] = v;
      ctx.translate(cx, cy);
      ctx.rotate(((a ?? 0) * Math.PI) / 180);
      ctx.translate(-cx, -cy);
    }
  }
}

/** Adds a path's outline (path data M L H V Z, absolute or relative) to the context's current path. */
function tracePathData(ctx: Ctx, d: string): void {
  const parts = d.match(/[MLHVZmlhvz]|[-+]?(?:\d+\.?\d*|\.\d+)(?:e[-+]?\d+)?/g) ?? [];
  let cmd = '', x = 0, y = 0, sx = 0, sy = 0;
  for (let i = 0; i < parts.length;) {
    if (/^[A-Za-z]$/.test(parts[i])) cmd = parts[i++];
    const rel = cmd === cmd.toLowerCase();
    const take = () => Number(parts[i++]);
    switch (cmd.toUpperCase()) {
      case 'M': x = take() + (rel ? x : 0); y = take() + (rel ? y : 0); ctx.moveTo(x, y); [sx, sy] = [x, y]; cmd = rel ? 'l' : 'L'; break;
      case 'L': x = take() + (rel ? x : 0); y = take() + (rel ? y : 0); ctx.lineTo(x, y); break;
      case 'H': x = take() + (rel ? x : 0); ctx.lineTo(x, y); break;
      case 'V': y = take() + (rel ? y : 0); ctx.lineTo(x, y); break;
      case 'Z': ctx.closePath(); [x, y] = [sx, sy]; break;
      default: i++;
    }
  }
}

/** Adds the element's outline to the context's current path; false for an element with no outline. */
function traceShape(ctx: Ctx, n: SvgNode): boolean {
  const a = n.attrs;
  switch (n.tag) {
    case 'rect': ctx.rect(num(a.x), num(a.y), num(a.width), num(a.height)); return true;
    case 'line': ctx.moveTo(num(a.x1), num(a.y1)); ctx.lineTo(num(a.x2), num(a.y2)); return true;
    case 'circle': ctx.moveTo(num(a.cx) + num(a.r), num(a.cy)); ctx.arc(num(a.cx), num(a.cy), num(a.r), 0, 2 * Math.PI); return true;
    case 'path': tracePathData(ctx, a.d ?? ''); return true;
    case 'polyline':
    case 'polygon': {
      const v = numbers(a.points ?? '');
      for (let i = 0; i + 1 < v.length; i += 2) {
        if (i === 0) ctx.moveTo(v[i], v[i + 1]);
        else ctx.lineTo(v[i], v[i + 1]);
      }
      if (n.tag === 'polygon' && v.length >= 4) ctx.closePath();
      return true;
    }
    default: return false;
  }
}

function setStroke(ctx: Ctx, s: Style, alpha: number): boolean {
  if (s.stroke === 'none' || !(num(s['stroke-width'], 1) > 0)) return false;
  ctx.strokeStyle = s.stroke;
  ctx.globalAlpha = alpha * num(s['stroke-opacity'], 1);
  ctx.lineWidth = num(s['stroke-width'], 1);
  ctx.lineJoin = s['stroke-linejoin'] as CanvasLineJoin;
  ctx.lineCap = s['stroke-linecap'] as CanvasLineCap;
  ctx.miterLimit = 4;
  ctx.setLineDash(s['stroke-dasharray'] === 'none' ? [] : numbers(s['stroke-dasharray']));
  return true;
}

function setFill(ctx: Ctx, s: Style, alpha: number): boolean {
  if (s.fill === 'none') return false;
  ctx.fillStyle = s.fill;
  ctx.globalAlpha = alpha * num(s['fill-opacity'], 1);
  return true;
}

function paintText(ctx: Ctx, n: SvgNode, s: Style, alpha: number): void {
  const text = n.text.replace(/\s+/g, ' ').trim();
  if (!text) return;
  const bold = s['font-weight'] === 'bold' || num(s['font-weight'], 400) >= 600;
  ctx.font = `${bold ? 'bold ' : ''}${num(s['font-size'], 16)}px ${s['font-family']}`;
  ctx.textAlign = s['text-anchor'] === 'middle' ? 'center' : s['text-anchor'] === 'end' ? 'end' : 'start';
  ctx.textBaseline = 'alphabetic';
  const [x, y] = [num(n.attrs.x), num(n.attrs.y)];
  const stroke = () => { if (setStroke(ctx, s, alpha)) ctx.strokeText(text, x, y); };
  const fill = () => { if (setFill(ctx, s, alpha)) ctx.fillText(text, x, y); };
  if (s['paint-order'].trim().startsWith('stroke')) { stroke(); fill(); } else { fill(); stroke(); }
}

interface Paint { ctx: Ctx; clips: Map<string, SvgNode> }

function clipTo(p: Paint, ref: string): void {
  const id = /url\(#([^)]+)\)/.exec(ref)?.[1];
  const clip = id ? p.clips.get(id) : undefined;
  if (!clip) return;
  p.ctx.beginPath();
  for (const c of clip.children) traceShape(p.ctx, c);
  p.ctx.clip();
}

function paintNode(p: Paint, n: SvgNode, inherited: Style): void {
  if (n.tag === 'defs' || n.tag === 'clipPath' || n.tag === 'title' || n.tag === 'image') return;
  const s: Style = { ...inherited };
  for (const k of INHERITED) if (n.attrs[k] !== undefined) s[k] = n.attrs[k];
  const { ctx } = p;
  ctx.save();
  if (n.attrs.transform) applyTransform(ctx, n.attrs.transform);
  if (n.attrs['clip-path']) clipTo(p, n.attrs['clip-path']);
  const alpha = num(n.attrs.opacity, 1);
  if (n.tag === 'g' || n.tag === 'svg') for (const c of n.children) paintNode(p, c, s);
  else if (n.tag === 'text') paintText(ctx, n, s, alpha);
  else {
    ctx.beginPath();
    if (traceShape(ctx, n)) {
      // A line has no inside; a polyline is filled as if closed, as SVG does.
      if (n.tag !== 'line' && setFill(ctx, s, alpha)) ctx.fill();
      if (setStroke(ctx, s, alpha)) ctx.stroke();
    }
  }
  ctx.restore();
}

function collectClips(n: SvgNode, into: Map<string, SvgNode>): void {
  if (n.tag === 'clipPath' && n.attrs.id) into.set(n.attrs.id, n);
  for (const c of n.children) collectClips(c, into);
}

/**
 * Paints a parsed figure (parseFigureSvg) onto the context, its viewBox scaled to width × height canvas
 * pixels. Paints over what the canvas already holds (the figure's own background comes first in it).
 */
export function paintFigureSvg(ctx: Ctx, svg: SvgNode, width: number, height: number): void {
  const clips = new Map<string, SvgNode>();
  collectClips(svg, clips);
  const vb = numbers(svg.attrs.viewBox ?? `0 0 ${svg.attrs.width ?? width} ${svg.attrs.height ?? height}`);
  ctx.save();
  ctx.scale(width / (vb[2] || width), height / (vb[3] || height));
  ctx.translate(-(vb[0] ?? 0), -(vb[1] ?? 0));
  paintNode({ ctx, clips }, svg, INITIAL);
  ctx.restore();
}

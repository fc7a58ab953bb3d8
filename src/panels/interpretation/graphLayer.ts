// What of the area–depth graph follows a drag, drawn on a canvas over the graph's SVG: the band, the fitted lines,
// the residuals, the detachment marks and the points with their labels, in the SVG's own coordinates, order, colours
// and sizes (interpretation.css). While a gesture runs the SVG holds still (its axes, ticks and labels are the same
// as long as the shape below is: AreaDepthGraph renders the SVG again when it changes) and this layer is drawn once a
// frame instead of rendering the SVG's hundred-odd elements; the SVG is shown again when the gesture ends.
import { EXACT_FIT_TEXT, formatInterval, formatLength } from '../../format/formatQuantity';
import { isExactFit } from '../../core/analysis/isExactFit';
import type { AreaDepthAxes } from '../../format/areaDepthAxes';
import type { AreaDepthSeries, GraphPoint } from './areaDepthSeries';
import { graphDomain } from './graphDomain';
import { niceTicks } from '../../format/niceTicks';
import { linearScale, type LinearScale } from './linearScale';
import { linspace, meanBand } from './meanBand';

/** The graph's width in SVG units and its margins. */
export const GRAPH_W = 400;
export const GRAPH_M = { left: 58, right: 14, top: 14, bottom: 40 };

export interface GraphSeriesSpec {
  key: string;
  label: string;
  colour: string;
  series: AreaDepthSeries;
}

export interface GraphFrame {
  domain: AreaDepthAxes;
  xs: LinearScale;
  ys: LinearScale;
  /** Depths at which the band is drawn. */
  depthsAcross: number[];
}

/** The axes and scales of a graph `height` SVG units high; null when there are no points. */
export function graphFrame(series: readonly GraphSeriesSpec[], dataOnly: boolean, units: string, height: number): GraphFrame | null {
  const domain = graphDomain(series.map((s) => s.series), dataOnly, units);
  return domain && frameOver(domain, height);
}

function frameOver(domain: AreaDepthAxes, height: number): GraphFrame {
  return {
    domain,
    xs: linearScale(domain.area, [GRAPH_M.left, GRAPH_W - GRAPH_M.right]),
    ys: linearScale(domain.depth, [GRAPH_M.top, height - GRAPH_M.bottom]),
    depthsAcross: linspace(domain.depth[0], domain.depth[1], 48),
  };
}

/** The line's area at depth h, or null without a line. */
export const lineAt = (s: AreaDepthSeries, h: number): number | null => (s.fit.result ? s.fit.result.intercept + s.fit.result.slope * h : null);

/** A point's label: its name without "Top ", cut at 18 characters. */
export function pointLabelText(p: GraphPoint): string {
  const name = p.name.replace(/^Top /, '');
  return name.length > 18 ? `${name.slice(0, 17)}…` : name;
}

/** Whether a point's label stands to its right (points left of the middle) or to its left. */
export const labelRight = (x: number): boolean => x < (GRAPH_M.left + GRAPH_W - GRAPH_M.right) / 2 + 40;

/** The band's corners: lo side down, hi side back up (SVG units); null when the fit has no band. */
export function bandCorners(s: AreaDepthSeries, f: GraphFrame): [number, number][] | null {
  const fit = s.fit.fit;
  const band = fit ? meanBand(fit, f.depthsAcross, 0.95) : null;
  if (!band) return null;
  const out: [number, number][] = band.map((b) => [f.xs.map(b.lo), f.ys.map(b.x)]);
  for (let i = band.length - 1; i >= 0; i--) out.push([f.xs.map(band[i].hi), f.ys.map(band[i].x)]);
  return out;
}

/** The detachment label's text, or null when there is no detachment to mark. */
export function detachmentText(s: AreaDepthSeries, units: string): string | null {
  const r = s.fit.result;
  if (!r || r.noDetachment || r.detachmentDepth === null) return null;
  const f = r.detachmentDepthInterval;
  return `detachment ${formatLength(r.detachmentDepth, units)}${isExactFit(r) ? ` (${EXACT_FIT_TEXT})` : f.kind === 'bounded' ? ` (95%: ${formatInterval([f.lo, f.hi], units)})` : f.kind === 'unbounded' ? ' (95% interval unbounded)' : ''}`;
}

/**
 * What of a graph drawn in `frame` the layer cannot draw: its area unit, and whether the graph's own axes
 * (graphFrame) lie within the frame's. The layer draws everything inside the plot; while a gesture runs the graph
 * keeps its axes as long as what its own would show fits in them (widening them when it does not, unionFrame), so
 * they do not jump with every move (the Fieller interval can change by thousands of metres between two pixels), and
 * takes its own again when the gesture ends.
 */
export function graphShape(series: readonly GraphSeriesSpec[], frame: GraphFrame, dataOnly: boolean, units: string): string {
  const f = graphFit(series, frame, dataOnly, units);
  return f ? `${f.parts} ${f.within}` : 'none';
}

/** The shape's two halves: what only a render can change (`parts`), and whether the own axes fit in the frame's. */
export function graphFit(series: readonly GraphSeriesSpec[], frame: GraphFrame, dataOnly: boolean, units: string): { parts: string; within: boolean } | null {
  const own = graphDomain(series.map((s) => s.series), dataOnly, units);
  if (!own) return null;
  // The area unit (the ticks' labels), and which series mark a detachment (its label's text is kept in the SVG too:
  // detachmentLabels).
  return { parts: `${own.unit.label} ${series.map((s) => detachmentText(s.series, units) !== null).join(' ')}`, within: within(own, frame.domain) };
}

/** The detachment labels' texts in the order the graph's SVG has them (series marking a detachment, if labelled). */
export function detachmentLabels(series: readonly GraphSeriesSpec[], units: string, interactive: boolean): string[] {
  if (!interactive && series.length !== 1) return [];
  const out: string[] = [];
  for (const s of series) {
    const t = detachmentText(s.series, units);
    if (t !== null) out.push(t);
  }
  return out;
}

/** Whether axes `a` lie within axes `b`. */
export function within(a: AreaDepthAxes, b: AreaDepthAxes): boolean {
  return a.area[0] >= b.area[0] && a.area[1] <= b.area[1] && a.depth[0] >= b.depth[0] && a.depth[1] <= b.depth[1];
}

/** The frame over both frames' axes (in the first's area unit), with ticks by the axes' own rule (areaDepthAxes). */
export function unionFrame(a: GraphFrame, b: GraphFrame, height: number): GraphFrame {
  const area: [number, number] = [Math.min(a.domain.area[0], b.domain.area[0]), Math.max(a.domain.area[1], b.domain.area[1])];
  const depth: [number, number] = [Math.min(a.domain.depth[0], b.domain.depth[0]), Math.max(a.domain.depth[1], b.domain.depth[1])];
  const unit = a.domain.unit;
  return frameOver({
    area, depth, unit,
    areaTicks: niceTicks(area[0] * unit.factor, area[1] * unit.factor, 5).values,
    depthTicks: niceTicks(depth[0], depth[1], 6).values,
  }, height);
}

/** Colours and font the CSS gives the graph (read once from the page). */
export interface GraphLayerStyle {
  fontFamily: string;
  ink: string;
}

/** Draws the moving parts for `series` in frame `f` onto `ctx`, whose transform maps SVG units to its pixels. */
export function drawGraphLayer(ctx: CanvasRenderingContext2D, series: readonly GraphSeriesSpec[], f: GraphFrame, height: number, interactive: boolean, units: string, style: GraphLayerStyle): void {
  const { xs, ys, domain } = f;
  const main = series[0];
  ctx.save();
  ctx.beginPath();
  ctx.rect(GRAPH_M.left, GRAPH_M.top, GRAPH_W - GRAPH_M.left - GRAPH_M.right, height - GRAPH_M.top - GRAPH_M.bottom);
  ctx.clip();
  // The band (.band: the series' colour at 0.16).
  const corners = interactive ? bandCorners(main.series, f) : null;
  if (corners) {
    ctx.globalAlpha = 0.16;
    ctx.fillStyle = main.colour;
    ctx.beginPath();
    corners.forEach(([x, y], i) => (i === 0 ? ctx.moveTo(x, y) : ctx.lineTo(x, y)));
    ctx.closePath();
    ctx.fill();
    ctx.globalAlpha = 1;
  }
  // The fitted lines (.fit-line: 1.6 wide).
  ctx.lineWidth = 1.6;
  for (const s of series) {
    if (!s.series.fit.result) continue;
    ctx.strokeStyle = s.colour;
    ctx.beginPath();
    ctx.moveTo(xs.map(lineAt(s.series, domain.depth[0])!), ys.map(domain.depth[0]));
    ctx.lineTo(xs.map(lineAt(s.series, domain.depth[1])!), ys.map(domain.depth[1]));
    ctx.stroke();
  }
  // Each point's distance off the line (.residual: 1 wide, dashed 2 2).
  if (interactive) {
    ctx.strokeStyle = '#9a5b00';
    ctx.lineWidth = 1;
    ctx.setLineDash([2, 2]);
    ctx.beginPath();
    for (const p of main.series.points) {
      if (!p.included || p.residual === null) continue;
      ctx.moveTo(xs.map(p.area), ys.map(p.depth));
      ctx.lineTo(xs.map(p.area - p.residual), ys.map(p.depth));
    }
    ctx.stroke();
    ctx.setLineDash([]);
  }
  for (const s of series) drawDetachment(ctx, s, f, units, style, interactive || series.length === 1);
  ctx.restore();
  series.forEach((s, si) => {
    for (const p of s.series.points) drawPoint(ctx, p, s.colour, xs.map(p.area), ys.map(p.depth), interactive, interactive && si === 0, style);
  });
}

function drawDetachment(ctx: CanvasRenderingContext2D, s: GraphSeriesSpec, f: GraphFrame, units: string, style: GraphLayerStyle, labelled: boolean): void {
  const r = s.series.fit.result;
  const text = detachmentText(s.series, units);
  if (!r || text === null || r.detachmentDepth === null) return;
  const x0 = f.xs.map(0);
  const y = f.ys.map(r.detachmentDepth);
  const fi = r.detachmentDepthInterval;
  if (fi.kind === 'bounded') {
    // The Fieller bar (.fieller line: 2 wide) with its end ticks.
    const lo = f.ys.map(fi.lo), hi = f.ys.map(fi.hi);
    ctx.strokeStyle = s.colour;
    ctx.lineWidth = 2;
    ctx.beginPath();
    ctx.moveTo(x0, lo); ctx.lineTo(x0, hi);
    ctx.moveTo(x0 - 5, lo); ctx.lineTo(x0 + 5, lo);
    ctx.moveTo(x0 - 5, hi); ctx.lineTo(x0 + 5, hi);
    ctx.stroke();
  }
  ctx.beginPath();
  ctx.moveTo(x0, y - 6); ctx.lineTo(x0 + 6, y); ctx.lineTo(x0, y + 6); ctx.lineTo(x0 - 6, y);
  ctx.closePath();
  ctx.fillStyle = s.colour;
  ctx.fill();
  ctx.strokeStyle = '#ffffff';
  ctx.lineWidth = 1;
  ctx.stroke();
  if (labelled) haloText(ctx, text, x0 + 9, y + 4, 'left', `10.5px ${style.fontFamily}`, style.ink);
}

function drawPoint(ctx: CanvasRenderingContext2D, p: GraphPoint, colour: string, x: number, y: number, interactive: boolean, labelled: boolean, style: GraphLayerStyle): void {
  ctx.beginPath();
  ctx.arc(x, y, interactive ? 5 : 4, 0, 2 * Math.PI);
  ctx.fillStyle = p.included ? colour : '#ffffff';
  ctx.fill();
  ctx.strokeStyle = colour;
  ctx.lineWidth = 1.6;
  ctx.stroke();
  if (!labelled) return;
  const right = labelRight(x);
  // .point-label, and .excluded: grey italic.
  haloText(ctx, pointLabelText(p), right ? x + 8 : x - 8, y - 6, right ? 'left' : 'right', `${p.included ? '' : 'italic '}10px ${style.fontFamily}`, p.included ? '#25313a' : '#7b8790');
}

/** Text with a white halo under it (paint-order: stroke; 3 wide). */
function haloText(ctx: CanvasRenderingContext2D, text: string, x: number, y: number, align: CanvasTextAlign, font: string, fill: string): void {
  ctx.font = font;
  ctx.textAlign = align;
  ctx.textBaseline = 'alphabetic';
  ctx.strokeStyle = '#ffffff';
  ctx.lineWidth = 3;
  ctx.lineJoin = 'miter';
  ctx.strokeText(text, x, y);
  ctx.fillStyle = fill;
  ctx.fillText(text, x, y);
}

// The area–depth graph (Epard & Groshong 1993): excess area across, depth below the reference down.
// One point per horizon (hollow when excluded), the fitted line, its 95% band for the mean, and the
// zero-area intercept marked as the detachment with its Fieller interval. Plain SVG drawn by React; with `follow`
// its moving parts follow a gesture on a canvas over it instead (graphLayer.ts), one draw a frame.
import { useEffect, useLayoutEffect, useMemo, useRef, useState } from 'react';
import type { TwoSegmentFit } from '../../core/analysis/twoSegmentFit';
import type { ProjectDoc } from '../../core/model/projectDoc';
import { useDocStore } from '../../state/docStore';
import type { AreaDepthSeries, GraphPoint } from './areaDepthSeries';
import { formatArea, formatLength, formatNumber } from '../../format/formatQuantity';
import { GRAPH_M as M, GRAPH_W as W, bandCorners, detachmentLabels, detachmentText, drawGraphLayer, graphFrame, graphShape, labelRight, lineAt, pointLabelText, type GraphFrame, type GraphLayerStyle, type GraphSeriesSpec } from './graphLayer';

export type { GraphSeriesSpec } from './graphLayer';

/** How a graph follows a gesture: the document its series were made from, and the series of another document. */
export interface GraphFollow {
  doc: ProjectDoc;
  read: (doc: ProjectDoc, gestureStart: ProjectDoc | null) => GraphSeriesSpec[] | null;
  /** The axes to draw in (during a gesture, kept from earlier in it: graphShape); null: the series' own. */
  frame: GraphFrame | null;
}

interface Props {
  series: GraphSeriesSpec[];
  units: string;
  dataOnly: boolean;
  /** Band, residuals, labels and click-to-toggle for the first series only. */
  interactive?: boolean;
  onTogglePoint?: (point: GraphPoint) => void;
  twoSegment?: TwoSegmentFit | null;
  testId?: string;
  height?: number;
  /** The depth axis title; default "Depth below reference (units)". */
  depthLabel?: string;
  /** Draws the store's document on the graph's canvas during a gesture while its shape is the rendered one's. */
  follow?: GraphFollow;
}

export function AreaDepthGraph({ series, units, dataOnly, interactive = false, onTogglePoint, twoSegment, testId, height = 300, depthLabel, follow }: Props) {
  const svgRef = useRef<SVGSVGElement>(null);
  const [hover, setHover] = useState<{ area: number; depth: number } | null>(null);
  const [hoverPoint, setHoverPoint] = useState<GraphPoint | null>(null);
  const H = height;
  const kept = follow?.frame ?? null;
  const frame = useMemo(() => kept ?? graphFrame(series, dataOnly, units, H), [kept, series, dataOnly, units, H]);
  const layer = useFollowLayer(follow && frame ? { follow, frame, series, dataOnly, units, height: H, interactive } : null);
  if (!frame) return <p className="hint">No horizons with a regional yet.</p>;
  const { domain, xs, ys } = frame;
  const { unit, areaTicks, depthTicks } = domain;
  const main = series[0];

  const toData = (e: React.MouseEvent): { area: number; depth: number } | null => {
    const svg = svgRef.current;
    const ctm = svg?.getScreenCTM();
    if (!svg || !ctm) return null;
    const p = new DOMPoint(e.clientX, e.clientY).matrixTransform(ctm.inverse());
    if (p.x < M.left || p.x > W - M.right || p.y < M.top || p.y > H - M.bottom) return null;
    return { area: xs.invert(p.x), depth: ys.invert(p.y) };
  };

  const refElev = main.series.referenceElevation;

  return (
    <div className="graph-box">
      <div className="graph-plot">
      <svg
        ref={svgRef}
        viewBox={`0 0 ${W} ${H}`}
        className="area-depth-graph"
        data-testid={testId}
        role="img"
        aria-label="Area–depth graph"
        onMouseMove={(e) => setHover(toData(e))}
        onMouseLeave={() => setHover(null)}
      >
        <defs>
          <clipPath id={`plot-${testId ?? 'g'}`}>
            <rect x={M.left} y={M.top} width={W - M.left - M.right} height={H - M.top - M.bottom} />
          </clipPath>
        </defs>
        <rect x={M.left} y={M.top} width={W - M.left - M.right} height={H - M.top - M.bottom} className="plot-bg" />
        {areaTicks.map((t) => (
          <g key={`a${t}`}>
            <line x1={xs.map(t / unit.factor)} x2={xs.map(t / unit.factor)} y1={M.top} y2={H - M.bottom} className={t === 0 ? 'grid zero' : 'grid'} />
            <text x={xs.map(t / unit.factor)} y={H - M.bottom + 13} className="tick" textAnchor="middle">{formatNumber(t)}</text>
          </g>
        ))}
        {depthTicks.map((t) => (
          <g key={`d${t}`}>
            <line x1={M.left} x2={W - M.right} y1={ys.map(t)} y2={ys.map(t)} className="grid" />
            <text x={M.left - 4} y={ys.map(t) + 3.5} className="tick" textAnchor="end">{formatNumber(t)}</text>
          </g>
        ))}
        <text x={(M.left + W - M.right) / 2} y={H - 6} className="axis-label" textAnchor="middle">Excess area ({unit.label})</text>
        <text transform={`translate(12 ${(M.top + H - M.bottom) / 2}) rotate(-90)`} className="axis-label" textAnchor="middle">{depthLabel ?? `Depth below reference (${units})`}</text>
        <g clipPath={`url(#plot-${testId ?? 'g'})`} ref={layer.clipped}>
          {interactive && main.series.fit.fit && <Band s={main.series} frame={frame} colour={main.colour} />}
          {series.map((s) => s.series.fit.result && (
            <polyline key={`l${s.key}`} className="fit-line" stroke={s.colour}
              points={[domain.depth[0], domain.depth[1]].map((h) => `${xs.map(lineAt(s.series, h)!)},${ys.map(h)}`).join(' ')} />
          ))}
          {interactive && twoSegment && <TwoSegmentLines fit={twoSegment} domain={domain.depth} xs={xs} ys={ys} />}
          {interactive && main.series.points.filter((p) => p.included && p.residual !== null).map((p) => (
            <line key={`r${p.id}`} className="residual" x1={xs.map(p.area)} x2={xs.map(p.area - (p.residual ?? 0))} y1={ys.map(p.depth)} y2={ys.map(p.depth)} />
          ))}
          {series.map((s) => <Detachment key={`z${s.key}`} s={s} xs={xs} ys={ys} units={units} labelled={interactive || series.length === 1} testId={interactive ? 'graph-detachment' : undefined} />)}
        </g>
        <g ref={layer.points}>
        {series.map((s, si) => s.series.points.map((p, i) => (
          <g
            key={`p${s.key}-${p.id}`}
            className={interactive && si === 0 ? 'graph-point clickable' : 'graph-point'}
            onMouseEnter={() => setHoverPoint(p)}
            onMouseLeave={() => setHoverPoint(null)}
            onClick={interactive && si === 0 && onTogglePoint ? () => onTogglePoint(p) : undefined}
          >
            <circle cx={xs.map(p.area)} cy={ys.map(p.depth)} r={interactive ? 5 : 4} stroke={s.colour} fill={p.included ? s.colour : '#ffffff'} strokeWidth={1.6} />
            {interactive && si === 0 && <PointLabel p={p} x={xs.map(p.area)} y={ys.map(p.depth)} right={labelRight(xs.map(p.area))} />}
            {/* The hit target last, on top of the label, so a click on the point always lands on it. */}
            <circle cx={xs.map(p.area)} cy={ys.map(p.depth)} r={10} fill="transparent"
              data-testid={interactive && si === 0 ? `graph-point-${i}` : undefined} data-included={p.included ? 'yes' : 'no'} data-name={p.name} />
          </g>
        )))}
        </g>
      </svg>
      {follow && <canvas ref={layer.canvas} className="graph-layer" aria-hidden="true" />}
      </div>
      {series.length > 1 && (
        // Below the plot, not on it, so that it never covers a point.
        <ul className="graph-legend" data-testid={testId ? `${testId}-legend` : undefined}>
          {series.map((s) => (
            <li key={`k${s.key}`}><span className="legend-line" style={{ background: s.colour }} />{s.label}</li>
          ))}
        </ul>
      )}
      <div className="graph-readout" data-testid={testId ? `${testId}-readout` : undefined}>
        {hoverPoint ? (
          <span>
            <b>{hoverPoint.name}</b>: {formatArea(hoverPoint.area, units, unit)} at {formatLength(hoverPoint.depth, units)} depth (regional at {formatLength(refElev - hoverPoint.depth, units)})
            {hoverPoint.residual !== null ? `, off the line by ${formatArea(hoverPoint.residual, units, unit)}` : ''}
            {interactive ? (hoverPoint.included ? ' — click to leave it out of the fit' : ' — left out; click to include') : ''}
          </span>
        ) : hover ? (
          <span>
            Cursor: {formatArea(hover.area, units, unit)}, depth {formatLength(hover.depth, units)} (elevation {formatLength(refElev - hover.depth, units)})
            {lineAt(main.series, hover.depth) !== null ? `; line: ${formatArea(lineAt(main.series, hover.depth), units, unit)}` : ''}
          </span>
        ) : (
          <span className="hint">Hover for values{interactive ? '; click a point to include or leave out its horizon' : ''}.</span>
        )}
      </div>
    </div>
  );
}

type Scale = GraphFrame['xs'];

function Band({ s, frame, colour }: { s: AreaDepthSeries; frame: GraphFrame; colour: string }) {
  const corners = bandCorners(s, frame);
  if (!corners) return null;
  return <polygon className="band" fill={colour} points={corners.map(([x, y]) => `${x},${y}`).join(' ')} data-testid="graph-band" />;
}

function Detachment({ s, xs, ys, units, labelled, testId }: { s: GraphSeriesSpec; xs: Scale; ys: Scale; units: string; labelled: boolean; testId?: string }) {
  const r = s.series.fit.result;
  if (!r || r.noDetachment || r.detachmentDepth === null) return null;
  const x0 = xs.map(0);
  const y = ys.map(r.detachmentDepth);
  const f = r.detachmentDepthInterval;
  return (
    <g className="detachment-mark" data-testid={testId}>
      {f.kind === 'bounded' && (
        <g stroke={s.colour} className="fieller">
          <line x1={x0} x2={x0} y1={ys.map(f.lo)} y2={ys.map(f.hi)} />
          <line x1={x0 - 5} x2={x0 + 5} y1={ys.map(f.lo)} y2={ys.map(f.lo)} />
          <line x1={x0 - 5} x2={x0 + 5} y1={ys.map(f.hi)} y2={ys.map(f.hi)} />
        </g>
      )}
      <path d={`M ${x0} ${y - 6} L ${x0 + 6} ${y} L ${x0} ${y + 6} L ${x0 - 6} ${y} Z`} fill={s.colour} stroke="#ffffff" strokeWidth={1} />
      {labelled && <text x={x0 + 9} y={y + 4} className="detachment-label">{detachmentText(s.series, units)}</text>}
    </g>
  );
}

function TwoSegmentLines({ fit, domain, xs, ys }: { fit: TwoSegmentFit; domain: [number, number]; xs: Scale; ys: Scale }) {
  const seg = (r: TwoSegmentFit['upper']['result'], cls: string) =>
    r && <polyline className={cls} points={domain.map((h) => `${xs.map(r.intercept + r.slope * h)},${ys.map(h)}`).join(' ')} />;
  const meet = fit.upperDetachmentDepth;
  return (
    <g data-testid="graph-two-segment">
      {seg(fit.upper.result, 'segment upper')}
      {seg(fit.lower.result, 'segment lower')}
      {meet !== null && fit.upper.result && (
        <circle cx={xs.map(fit.upper.result.intercept + fit.upper.result.slope * meet)} cy={ys.map(meet)} r={4} className="segment-meet" />
      )}
    </g>
  );
}

function PointLabel({ p, x, y, right }: { p: GraphPoint; x: number; y: number; right: boolean }) {
  const text = pointLabelText(p);
  return (
    <text x={right ? x + 8 : x - 8} y={y - 6} textAnchor={right ? 'start' : 'end'} className={p.included ? 'point-label' : 'point-label excluded'}>
      {text}
    </text>
  );
}

interface FollowArgs {
  follow: GraphFollow;
  frame: GraphFrame;
  series: GraphSeriesSpec[];
  dataOnly: boolean;
  units: string;
  height: number;
  interactive: boolean;
}

/**
 * The canvas layer of a following graph: after each move of a gesture (one draw a frame) the store's document is
 * drawn on it and the SVG's moving parts are hidden, as long as the store's graph has the rendered one's shape
 * (otherwise the graph renders, see LiveGraph); after every render the SVG shows them again and the layer is clear.
 * Its size comes from a ResizeObserver and its font and ink from the page once: a move reads no style or layout.
 */
function useFollowLayer(args: FollowArgs | null) {
  const clipped = useRef<SVGGElement>(null);
  const points = useRef<SVGGElement>(null);
  const canvas = useRef<HTMLCanvasElement>(null);
  const latest = useRef(args);
  const on = Boolean(args);
  useLayoutEffect(() => {
    const before = latest.current;
    latest.current = args;
    // A render of other series or axes shows them in the SVG; one of the same (the pane rendering round the graph)
    // leaves the layer as it is, so the SVG's moving parts are not restyled for nothing.
    if (!args || !before || before.series !== args.series || before.frame.domain !== args.frame.domain || before.dataOnly !== args.dataOnly) {
      hideLayer(clipped.current, points.current, canvas.current);
    }
  });
  useEffect(() => {
    const c = canvas.current;
    if (!on || !c) return;
    let width = 0;
    const sized = new ResizeObserver((entries) => {
      width = entries[entries.length - 1].contentRect.width;
    });
    sized.observe(c);
    // Read once, after the graph is first shown (not during a gesture).
    const css = getComputedStyle(c);
    const style: GraphLayerStyle = { fontFamily: css.fontFamily, ink: css.getPropertyValue('--ink').trim() || '#1c2329' };
    let rendered: { series: GraphSeriesSpec[]; frame: GraphFrame; shape: string } | null = null;
    let frameAsked = 0;
    const draw = () => {
      frameAsked = 0;
      const a = latest.current;
      const { doc, gestureStart } = useDocStore.getState();
      const specs = a && gestureStart && doc !== a.follow.doc ? a.follow.read(doc, gestureStart) : null;
      if (!a || !specs || width === 0) return hideLayer(clipped.current, points.current, c);
      if (rendered?.series !== a.series || rendered.frame !== a.frame) rendered = { series: a.series, frame: a.frame, shape: graphShape(a.series, a.frame, a.dataOnly, a.units) };
      // A graph of another shape is rendered instead (its render clears the layer).
      if (graphShape(specs, a.frame, a.dataOnly, a.units) !== rendered.shape) return;
      const dpr = window.devicePixelRatio || 1;
      const w = Math.max(1, Math.round(width * dpr));
      const h = Math.max(1, Math.round((width * a.height * dpr) / W));
      if (c.width !== w || c.height !== h) {
        c.width = w;
        c.height = h;
      }
      const ctx = c.getContext('2d');
      if (!ctx) return;
      ctx.setTransform(1, 0, 0, 1, 0, 0);
      ctx.clearRect(0, 0, w, h);
      ctx.setTransform(w / W, 0, 0, h / a.height, 0, 0);
      drawGraphLayer(ctx, specs, a.frame, a.height, a.interactive, a.units, style);
      // The hidden SVG's detachment labels keep the text drawn (what a reader of the page finds there).
      const labels = clipped.current?.querySelectorAll('.detachment-label') ?? [];
      const texts = detachmentLabels(specs, a.units, a.interactive);
      if (labels.length === texts.length) labels.forEach((el, i) => writeSvgText(el, texts[i]));
      drawn.add(c);
      showLayer(clipped.current, points.current);
    };
    const unsubscribe = useDocStore.subscribe((s, prev) => {
      if (s.gestureStart && s.doc !== prev.doc && !frameAsked) frameAsked = requestAnimationFrame(draw);
    });
    return () => {
      unsubscribe();
      sized.disconnect();
      if (frameAsked) cancelAnimationFrame(frameAsked);
    };
  }, [on]);
  return { clipped, points, canvas };
}

/** Sets an SVG text element's one text node in place. */
function writeSvgText(el: Element, text: string): void {
  const t = el.firstChild;
  if (t && !t.nextSibling && t.nodeType === Node.TEXT_NODE) {
    if ((t as Text).data !== text) (t as Text).data = text;
  } else if (el.textContent !== text) el.textContent = text;
}

/** The layers with something drawn on them. */
const drawn = new WeakSet<HTMLCanvasElement>();

/** The layer in use: the SVG's moving parts hidden (once, at the first frame drawn). */
function showLayer(clipped: SVGGElement | null, points: SVGGElement | null): void {
  if (clipped && clipped.style.visibility !== 'hidden') clipped.style.visibility = 'hidden';
  if (points && points.style.visibility !== 'hidden') points.style.visibility = 'hidden';
}

/** The SVG as rendered, the layer clear. */
function hideLayer(clipped: SVGGElement | null, points: SVGGElement | null, canvas: HTMLCanvasElement | null): void {
  if (clipped && clipped.style.visibility) clipped.style.visibility = '';
  if (points && points.style.visibility) points.style.visibility = '';
  if (canvas && drawn.has(canvas)) {
    canvas.getContext('2d')?.clearRect(0, 0, canvas.width, canvas.height);
    drawn.delete(canvas);
  }
}

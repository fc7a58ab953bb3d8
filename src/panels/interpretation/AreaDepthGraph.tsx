// The area–depth graph (Epard & Groshong 1993): excess area across, depth below the reference down.
// One point per horizon (hollow when excluded), the fitted line, its 95% band for the mean, and the
// zero-area intercept marked as the detachment with its Fieller interval. Plain SVG drawn by React.
import { useMemo, useRef, useState } from 'react';
import type { TwoSegmentFit } from '../../core/analysis/twoSegmentFit';
import type { AreaDepthSeries, GraphPoint } from './areaDepthSeries';
import { EXACT_FIT_TEXT, formatArea, formatInterval, formatLength, formatNumber } from '../../format/formatQuantity';
import { graphDomain } from './graphDomain';
import { linearScale } from './linearScale';
import { linspace, meanBand } from './meanBand';
import { isExactFit } from '../../core/analysis/isExactFit';

export interface GraphSeriesSpec {
  key: string;
  label: string;
  colour: string;
  series: AreaDepthSeries;
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
}

const W = 400;
const M = { left: 58, right: 14, top: 14, bottom: 40 };

export function AreaDepthGraph({ series, units, dataOnly, interactive = false, onTogglePoint, twoSegment, testId, height = 300, depthLabel }: Props) {
  const svgRef = useRef<SVGSVGElement>(null);
  const [hover, setHover] = useState<{ area: number; depth: number } | null>(null);
  const [hoverPoint, setHoverPoint] = useState<GraphPoint | null>(null);
  const H = height;
  const domain = useMemo(() => graphDomain(series.map((s) => s.series), dataOnly, units), [series, dataOnly, units]);
  if (!domain) return <p className="hint">No horizons with a regional yet.</p>;
  const { unit, areaTicks, depthTicks } = domain;
  const xs = linearScale(domain.area, [M.left, W - M.right]);
  const ys = linearScale(domain.depth, [M.top, H - M.bottom]);
  const depthsAcross = linspace(domain.depth[0], domain.depth[1], 48);
  const main = series[0];

  const toData = (e: React.MouseEvent): { area: number; depth: number } | null => {
    const svg = svgRef.current;
    const ctm = svg?.getScreenCTM();
    if (!svg || !ctm) return null;
    const p = new DOMPoint(e.clientX, e.clientY).matrixTransform(ctm.inverse());
    if (p.x < M.left || p.x > W - M.right || p.y < M.top || p.y > H - M.bottom) return null;
    return { area: xs.invert(p.x), depth: ys.invert(p.y) };
  };

  const lineAt = (s: AreaDepthSeries, h: number): number | null => (s.fit.result ? s.fit.result.intercept + s.fit.result.slope * h : null);
  const refElev = main.series.referenceElevation;

  return (
    <div className="graph-box">
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
        <g clipPath={`url(#plot-${testId ?? 'g'})`}>
          {interactive && main.series.fit.fit && <Band s={main.series} depths={depthsAcross} xs={xs} ys={ys} colour={main.colour} />}
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
        {series.map((s, si) => s.series.points.map((p, i) => (
          <g
            key={`p${s.key}-${p.id}`}
            className={interactive && si === 0 ? 'graph-point clickable' : 'graph-point'}
            onMouseEnter={() => setHoverPoint(p)}
            onMouseLeave={() => setHoverPoint(null)}
            onClick={interactive && si === 0 && onTogglePoint ? () => onTogglePoint(p) : undefined}
          >
            <circle cx={xs.map(p.area)} cy={ys.map(p.depth)} r={interactive ? 5 : 4} stroke={s.colour} fill={p.included ? s.colour : '#ffffff'} strokeWidth={1.6} />
            {interactive && si === 0 && <PointLabel p={p} x={xs.map(p.area)} y={ys.map(p.depth)} right={xs.map(p.area) < (M.left + W - M.right) / 2 + 40} />}
            {/* The hit target last, on top of the label, so a click on the point always lands on it. */}
            <circle cx={xs.map(p.area)} cy={ys.map(p.depth)} r={10} fill="transparent"
              data-testid={interactive && si === 0 ? `graph-point-${i}` : undefined} data-included={p.included ? 'yes' : 'no'} data-name={p.name} />
          </g>
        )))}
      </svg>
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

type Scale = ReturnType<typeof linearScale>;

function Band({ s, depths, xs, ys, colour }: { s: AreaDepthSeries; depths: number[]; xs: Scale; ys: Scale; colour: string }) {
  const fit = s.fit.fit!;
  const band = meanBand(fit, depths, 0.95);
  if (!band) return null;
  const pts = [...band.map((b) => `${xs.map(b.lo)},${ys.map(b.x)}`), ...[...band].reverse().map((b) => `${xs.map(b.hi)},${ys.map(b.x)}`)];
  return <polygon className="band" fill={colour} points={pts.join(' ')} data-testid="graph-band" />;
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
      {labelled && (
        <text x={x0 + 9} y={y + 4} className="detachment-label">
          detachment {formatLength(r.detachmentDepth, units)}
          {isExactFit(r) ? ` (${EXACT_FIT_TEXT})` : f.kind === 'bounded' ? ` (95%: ${formatInterval([f.lo, f.hi], units)})` : f.kind === 'unbounded' ? ' (95% interval unbounded)' : ''}
        </text>
      )}
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
  const name = p.name.replace(/^Top /, '');
  const text = name.length > 18 ? `${name.slice(0, 17)}…` : name;
  return (
    <text x={right ? x + 8 : x - 8} y={y - 6} textAnchor={right ? 'start' : 'end'} className={p.included ? 'point-label' : 'point-label excluded'}>
      {text}
    </text>
  );
}

// Histogram of Monte Carlo detachment depths with P10, P50 and P90 marked.
import { histogramBins } from './histogramBins';
import { linearScale } from './linearScale';
import { niceTicks } from '../../format/niceTicks';
import { formatNumber } from '../../format/formatQuantity';
import { maxOf } from '../../core/stats/minMax';

const W = 400;
const H = 190;
const M = { left: 44, right: 12, top: 26, bottom: 36 };

interface Props {
  values: Float64Array;
  spread: { p10: number; p50: number; p90: number };
  units: string;
  /** The unperturbed estimate, dashed; null to leave it out (e.g. for a result of an earlier section). */
  point: number | null;
  /** The axis title; default "Detachment depth below reference (units)". */
  label?: string;
}

export function Histogram({ values, spread, units, point, label }: Props) {
  const h = histogramBins(values, 28);
  if (h.counts.length === 0) return null;
  const sx = linearScale([h.edges[0], h.edges[h.edges.length - 1]], [M.left, W - M.right]);
  const top = maxOf(h.counts);
  const sy = linearScale([0, top], [H - M.bottom, M.top]);
  const marks: [string, number][] = [['P10', spread.p10], ['P50', spread.p50], ['P90', spread.p90]];
  return (
    <svg viewBox={`0 0 ${W} ${H}`} className="histogram" data-testid="mc-histogram" role="img" aria-label="Histogram of detachment depth">
      {h.counts.map((c, i) => (
        <rect key={i} x={sx.map(h.edges[i]) + 0.5} width={Math.max(0.5, sx.map(h.edges[i + 1]) - sx.map(h.edges[i]) - 1)} y={sy.map(c)} height={sy.map(0) - sy.map(c)} className="bar" />
      ))}
      <line x1={M.left} x2={W - M.right} y1={sy.map(0)} y2={sy.map(0)} className="axis" />
      {niceTicks(h.edges[0], h.edges[h.edges.length - 1], 5).values.map((t) => (
        <text key={t} x={sx.map(t)} y={H - M.bottom + 13} className="tick" textAnchor="middle">{formatNumber(t)}</text>
      ))}
      {niceTicks(0, top, 3).values.map((t) => (
        <text key={`c${t}`} x={M.left - 4} y={sy.map(t) + 3.5} className="tick" textAnchor="end">{t}</text>
      ))}
      {marks.map(([label, v]) => (
        <g key={label}>
          <line x1={sx.map(v)} x2={sx.map(v)} y1={M.top - 4} y2={sy.map(0)} className={label === 'P50' ? 'pmark p50' : 'pmark'} />
          <text x={sx.map(v)} y={M.top - 8} className="pmark-label" textAnchor="middle">{label}</text>
        </g>
      ))}
      {point !== null && <line x1={sx.map(point)} x2={sx.map(point)} y1={M.top} y2={sy.map(0)} className="point-mark" />}
      <text x={(M.left + W - M.right) / 2} y={H - 6} className="axis-label" textAnchor="middle">{label ?? `Detachment depth below reference (${units})`}; runs per bin up</text>
    </svg>
  );
}

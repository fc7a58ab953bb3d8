// A small line plot of a detachment value against a swept value (across), for the sensitivity pane:
// elevation is drawn with up as up, depth with down as down.
import { linearScale } from './linearScale';
import { niceDomain, niceTicks } from '../../format/niceTicks';
import { formatNumber } from '../../format/formatQuantity';
import { minOf, maxOf } from '../../core/stats/minMax';

interface Props {
  xs: number[];
  values: (number | null)[];
  /** True: larger values higher on the plot (elevation); false: lower (depth). */
  up: boolean;
  xLabel: string;
  yLabel: string;
  note: string;
  testId: string;
}

const W = 400;
const H = 190;
const M = { left: 58, right: 12, top: 22, bottom: 36 };

export function SweepPlot({ xs, values, up, xLabel, yLabel, note, testId }: Props) {
  const ok = values.filter((d): d is number => d !== null);
  if (ok.length < 2) return <p className="hint" data-testid={testId}>No detachment over this range.</p>;
  const [x0, x1] = [minOf(xs), maxOf(xs)];
  const [d0, d1] = niceDomain(minOf(ok), maxOf(ok), 4);
  const sx = linearScale([x0, x1], [M.left, W - M.right]);
  const sy = linearScale([d0, d1], up ? [H - M.bottom, M.top] : [M.top, H - M.bottom]);
  const runs: string[] = [];
  let cur: string[] = [];
  xs.forEach((x, i) => {
    const d = values[i];
    if (d === null) {
      if (cur.length) runs.push(cur.join(' '));
      cur = [];
    } else cur.push(`${sx.map(x)},${sy.map(d)}`);
  });
  if (cur.length) runs.push(cur.join(' '));
  return (
    <svg viewBox={`0 0 ${W} ${H}`} className="sweep-plot" data-testid={testId} role="img" aria-label={`${yLabel} against ${xLabel}`}>
      <rect x={M.left} y={M.top} width={W - M.left - M.right} height={H - M.top - M.bottom} className="plot-bg" />
      {niceTicks(x0, x1, 6).values.map((t) => (
        <g key={`x${t}`}>
          <line x1={sx.map(t)} x2={sx.map(t)} y1={M.top} y2={H - M.bottom} className={t === 0 ? 'grid zero' : 'grid'} />
          <text x={sx.map(t)} y={H - M.bottom + 13} className="tick" textAnchor="middle">{formatNumber(t)}</text>
        </g>
      ))}
      {niceTicks(d0, d1, 4).values.map((t) => (
        <g key={`y${t}`}>
          <line x1={M.left} x2={W - M.right} y1={sy.map(t)} y2={sy.map(t)} className="grid" />
          <text x={M.left - 4} y={sy.map(t) + 3.5} className="tick" textAnchor="end">{formatNumber(t)}</text>
        </g>
      ))}
      {runs.map((r, i) => <polyline key={i} points={r} className="sweep-line" />)}
      <text x={(M.left + W - M.right) / 2} y={H - 6} className="axis-label" textAnchor="middle">{xLabel}</text>
      <text transform={`translate(12 ${(M.top + H - M.bottom) / 2}) rotate(-90)`} className="axis-label" textAnchor="middle">{yLabel}</text>
      <text x={M.left + 4} y={M.top - 7} className="plot-note">{note}</text>
    </svg>
  );
}

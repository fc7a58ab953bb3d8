// Monte Carlo of the detachment in a Web Worker: σ fields, a seed, progress and cancel, and the
// histogram of depths with P10/P50/P90 and the share of runs without a valid detachment.
import { useEffect, useRef, useState } from 'react';
import type { MonteCarloOptions } from '../../core/analysis/monteCarlo';
import type { Section } from '../../core/model/section';
import { Histogram } from './Histogram';
import { formatLength, formatNumber, formatPercent } from './formatValue';
import type { MonteCarloDone, MonteCarloReply } from './monteCarloMessages';

interface Fields { runs: string; seed: string; vertex: string; offset: string; horizonOffset: string; tilt: string; scale: string; vertices: boolean }

const DEFAULTS: Fields = { runs: '2000', seed: '1', vertex: '10', offset: '20', horizonOffset: '0', tilt: '0', scale: '0', vertices: false };

function toOptions(f: Fields): MonteCarloOptions | string {
  const num = (s: string, name: string, min = 0): number | string => {
    const v = Number(s);
    return Number.isFinite(v) && v >= min ? v : `${name} must be a number of at least ${min}.`;
  };
  const vals = [num(f.runs, 'Runs', 1), num(f.seed, 'Seed'), num(f.vertex, 'Digitising σ'), num(f.offset, 'Regional offset σ'),
    num(f.horizonOffset, 'Per-horizon offset σ'), num(f.tilt, 'Tilt σ'), num(f.scale, 'Scale σ')];
  const bad = vals.find((v) => typeof v === 'string');
  if (typeof bad === 'string') return bad;
  const [runs, seed, vertex, offset, horizonOffset, tilt, scale] = vals as number[];
  return {
    runs: Math.min(200_000, Math.floor(runs)), seed: Math.floor(seed), sigmaVertex: vertex, sigmaOffset: offset, sigmaHorizonOffset: horizonOffset,
    sigmaTilt: tilt / 1000, sigmaScale: scale / 100, method: f.vertices ? 'vertices' : 'analytic',
  };
}

export function MonteCarloPanel({ section }: { section: Section }) {
  const [fields, setFields] = useState<Fields>(DEFAULTS);
  const [progress, setProgress] = useState<{ done: number; total: number } | null>(null);
  const [result, setResult] = useState<MonteCarloDone | null>(null);
  const [error, setError] = useState<string | null>(null);
  const worker = useRef<Worker | null>(null);
  const u = section.units;

  useEffect(() => () => worker.current?.terminate(), []);

  const stop = () => {
    worker.current?.terminate();
    worker.current = null;
    setProgress(null);
  };
  const run = () => {
    const options = toOptions(fields);
    if (typeof options === 'string') {
      setError(options);
      return;
    }
    stop();
    setError(null);
    setResult(null);
    const w = new Worker(new URL('./monteCarlo.worker.ts', import.meta.url), { type: 'module' });
    worker.current = w;
    setProgress({ done: 0, total: options.runs });
    w.onmessage = (e: MessageEvent<MonteCarloReply>) => {
      const m = e.data;
      if (m.type === 'progress') setProgress({ done: m.done, total: m.total });
      else {
        if (m.type === 'done') setResult(m);
        else setError(m.message);
        w.terminate();
        if (worker.current === w) worker.current = null;
        setProgress(null);
      }
    };
    w.onerror = () => {
      setError('The Monte Carlo worker could not run.');
      stop();
    };
    w.postMessage({ section, options });
  };
  const field = (key: keyof Fields, label: string, unit: string, testId: string) => (
    <label className="mc-field">
      <span>{label}</span>
      <input type="number" min={0} step="any" value={fields[key] as string} data-testid={testId}
        onChange={(e) => setFields({ ...fields, [key]: e.target.value })} />
      <span className="unit">{unit}</span>
    </label>
  );
  const running = progress !== null;
  return (
    <div className="monte-carlo">
      <div className="mc-grid">
        {field('vertex', 'Digitising σ (vertical, per vertex)', u, 'mc-sigma-vertex')}
        {field('offset', 'Regional offset σ (all together)', u, 'mc-sigma-offset')}
        {field('horizonOffset', 'Regional offset σ (each horizon)', u, 'mc-sigma-horizon-offset')}
        {field('tilt', 'Regional tilt σ (about the left pin)', `${u} per 1000 ${u}`, 'mc-sigma-tilt')}
        {field('scale', 'Calibration scale σ', '%', 'mc-sigma-scale')}
        {field('runs', 'Runs', '', 'mc-runs')}
        {field('seed', 'Seed (same seed, same result)', '', 'mc-seed')}
      </div>
      <label className="mc-check">
        <input type="checkbox" checked={fields.vertices} data-testid="mc-vertices" onChange={(e) => setFields({ ...fields, vertices: e.target.checked })} />
        Perturb every vertex and re-measure (slower; the default draws each horizon's area change directly, which is exact in distribution)
      </label>
      <div className="button-row">
        <button type="button" className="primary" onClick={run} disabled={running} data-testid="mc-run">Run</button>
        <button type="button" onClick={stop} disabled={!running} data-testid="mc-cancel">Cancel</button>
        {running && (
          <span className="mc-progress">
            <progress max={progress.total} value={progress.done} data-testid="mc-progress" /> {progress.done} / {progress.total}
          </span>
        )}
      </div>
      {error && <p className="diagnostic error">{error}</p>}
      {result && (
        <div className="mc-result" data-testid="mc-result">
          <table className="summary-table">
            <tbody>
              <tr><th>Detachment depth P10 / P50 / P90</th>
                <td><span data-testid="mc-p10">{formatLength(result.depth?.p10, u)}</span> / <span data-testid="mc-p50">{formatLength(result.depth?.p50, u)}</span> / <span data-testid="mc-p90">{formatLength(result.depth?.p90, u)}</span></td></tr>
              <tr><th>Detachment elevation P10 / P50 / P90</th>
                <td>{formatLength(result.elevation?.p10, u)} / {formatLength(result.elevation?.p50, u)} / {formatLength(result.elevation?.p90, u)}</td></tr>
              <tr><th>Displacement P10 / P50 / P90</th>
                <td>{formatLength(result.displacement?.p10, u)} / {formatLength(result.displacement?.p50, u)} / {formatLength(result.displacement?.p90, u)}</td></tr>
              <tr><th>Runs without a valid detachment</th><td data-testid="mc-failed">{formatPercent(result.failedShare)} of {result.runs}</td></tr>
              <tr><th>Depth spread (standard deviation)</th><td>{formatLength(result.depth?.sd, u)}</td></tr>
            </tbody>
          </table>
          {result.depth && <Histogram values={result.depths} spread={result.depth} units={u} point={result.pointDepth} />}
          <p className="hint">Dashed line: the estimate without perturbation ({formatNumber(result.pointDepth)} {u}). Report the spread, not one number.</p>
        </div>
      )}
    </div>
  );
}

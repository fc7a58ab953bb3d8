// Monte Carlo of the detachment in a Web Worker: σ fields, a seed, progress and cancel, and the
// histogram of depths with P10/P50/P90 and the share of runs without a valid detachment.
import { useEffect, useRef, useState } from 'react';
import type { MonteCarloOptions } from '../../core/analysis/monteCarlo';
import type { AnySection } from '../../core/model/section';
import { isStale, sectionKey } from '../../core/model/sectionKey';
import { useDocStore } from '../../state/docStore';
import { useUncertaintyStore } from '../../state/uncertaintyStore';
import { afterLinesChecked } from '../../state/linesChecked';
import { selectAnalysis } from '../../state/selectors';
import type { MonteCarloRecord } from '../../core/analysis/monteCarloRecord';
import { Histogram } from './Histogram';
import { formatLength, formatPercent } from '../../format/formatQuantity';
import type { MonteCarloDone, MonteCarloReply } from './monteCarloMessages';

/** The text shown over a result computed for another state of the section. */
export const STALE_TEXT = 'These results are for an earlier state of the section — run again.';

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

function recordOf(m: MonteCarloDone, section: AnySection, options: MonteCarloOptions, f: Fields, referenceElevation: number): MonteCarloRecord {
  const pct = (sp: MonteCarloDone['depth']) => (sp ? { p10: sp.p10, p50: sp.p50, p90: sp.p90 } : null);
  return {
    sectionKey: sectionKey(section), units: section.units, seed: options.seed, runs: m.runs, method: options.method ?? 'analytic',
    sigmas: { vertex: Number(f.vertex), offset: Number(f.offset), perHorizonOffset: Number(f.horizonOffset), tiltPerThousand: Number(f.tilt), scalePercent: Number(f.scale) },
    referenceElevation, depth: pct(m.depth), elevation: pct(m.elevation), displacement: pct(m.displacement), depthSd: m.depth?.sd ?? null,
    failedShare: m.failedShare, finishedAt: Date.now(), depths: m.depths, pointDepth: m.pointDepth,
  };
}

interface Props {
  scenarioId: string;
  /** The section as the pane shows it (whether a result is out of date); a run takes the section anew once its lines are checked. */
  section: AnySection;
}

export function MonteCarloPanel({ scenarioId, section }: Props) {
  const [fields, setFields] = useState<Fields>(DEFAULTS);
  const [progress, setProgress] = useState<{ done: number; total: number } | null>(null);
  // The last result of this scenario lives in the session store (the report reads it too), with the key of its section.
  const result = useUncertaintyStore((st) => st.byScenario[scenarioId] ?? null);
  const setMonteCarlo = useUncertaintyStore((st) => st.setMonteCarlo);
  const [error, setError] = useState<string | null>(null);
  const worker = useRef<Worker | null>(null);
  const u = section.units;

  useEffect(() => () => worker.current?.terminate(), []);
  // A run of the previous project must not finish into the next one (Project ▸ New, Open, restore).
  useEffect(() => useDocStore.subscribe((s, prev) => {
    if (s.opened === prev.opened || !worker.current) return;
    worker.current.terminate();
    worker.current = null;
    setProgress(null);
  }), []);

  const stop = () => {
    worker.current?.terminate();
    worker.current = null;
    setProgress(null);
  };
  const run = async () => {
    const options = toOptions(fields);
    if (typeof options === 'string') {
      setError(options);
      return;
    }
    stop();
    setError(null);
    // Not on a line that may yet be found to cross itself: wait for the checks, then take the section as the pane has it.
    if (!(await afterLinesChecked('The Monte Carlo run'))) return;
    const now = selectAnalysis(useDocStore.getState().doc, scenarioId);
    if (!now.docSection.ok || !now.outcome?.ok) {
      setError('The section can no longer be analysed: see the messages above.');
      return;
    }
    if (worker.current) return;
    // What this run analyses, fixed now: the section may change while it runs.
    const ran = { section: now.docSection.section, referenceElevation: now.outcome.analysis.referenceElevation, fields, scenarioId, opened: useDocStore.getState().opened };
    const w = new Worker(new URL('./monteCarlo.worker.ts', import.meta.url), { type: 'module' });
    worker.current = w;
    setProgress({ done: 0, total: options.runs });
    w.onmessage = (e: MessageEvent<MonteCarloReply>) => {
      const m = e.data;
      if (m.type === 'progress') setProgress({ done: m.done, total: m.total });
      else {
        if (m.type === 'failed') setError(m.message);
        else if (useDocStore.getState().opened === ran.opened) setMonteCarlo(ran.scenarioId, recordOf(m, ran.section, options, ran.fields, ran.referenceElevation));
        w.terminate();
        if (worker.current === w) worker.current = null;
        setProgress(null);
      }
    };
    w.onerror = () => {
      setError('The Monte Carlo worker could not run.');
      stop();
    };
    w.postMessage({ section: ran.section, options });
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
        <button type="button" className="primary" onClick={() => void run()} disabled={running} data-testid="mc-run">Run</button>
        <button type="button" onClick={stop} disabled={!running} data-testid="mc-cancel">Cancel</button>
        {running && (
          <span className="mc-progress">
            <progress max={progress.total} value={progress.done} data-testid="mc-progress" /> {progress.done} / {progress.total}
          </span>
        )}
      </div>
      {error && <p className="diagnostic error">{error}</p>}
      {result && !running && <MonteCarloResult result={result} stale={isStale(result, section)} />}
    </div>
  );
}

function MonteCarloResult({ result, stale }: { result: MonteCarloRecord; stale: boolean }) {
  const u = result.units;
  const three = (sp: MonteCarloRecord['depth'], id?: string) => (
    <>
      <span data-testid={id && `${id}-p10`}>{formatLength(sp?.p10, u)}</span> / <span data-testid={id && `${id}-p50`}>{formatLength(sp?.p50, u)}</span> / <span data-testid={id && `${id}-p90`}>{formatLength(sp?.p90, u)}</span>
    </>
  );
  const ref = formatLength(result.referenceElevation, u);
  return (
    <div className={`mc-result${stale ? ' stale' : ''}`} data-testid="mc-result" data-stale={stale ? 'yes' : 'no'}>
      {stale && <p className="diagnostic warning mc-stale" data-testid="mc-stale">{STALE_TEXT}</p>}
      <table className="summary-table">
        <tbody>
          <tr><th>Detachment elevation P10 / P50 / P90</th><td>{three(result.elevation, 'mc-elevation')}</td></tr>
          <tr><th>Detachment depth below {ref} P10 / P50 / P90</th>
            <td><span data-testid="mc-p10">{formatLength(result.depth?.p10, u)}</span> / <span data-testid="mc-p50">{formatLength(result.depth?.p50, u)}</span> / <span data-testid="mc-p90">{formatLength(result.depth?.p90, u)}</span></td></tr>
          <tr><th>Displacement P10 / P50 / P90</th><td>{three(result.displacement)}</td></tr>
          <tr><th>Runs without a valid detachment</th><td data-testid="mc-failed">{formatPercent(result.failedShare)} of {result.runs}</td></tr>
          <tr><th>Depth spread (standard deviation)</th><td>{formatLength(result.depthSd, u)}</td></tr>
          <tr><th>Run</th><td className="interval">seed {result.seed}, {result.method === 'vertices' ? 'every vertex perturbed' : 'areas drawn directly'}</td></tr>
        </tbody>
      </table>
      {result.depth && (
        <Histogram values={result.depths} spread={result.depth} units={u} point={stale ? null : result.pointDepth}
          label={`Detachment depth below ${ref} (${u})`} />
      )}
      {/* The unperturbed estimate of an earlier section is not the current one: say nothing of it then. */}
      {!stale && <p className="hint">Dashed line: the estimate without perturbation ({formatLength(result.pointDepth, u)}). Report the spread, not one number.</p>}
    </div>
  );
}

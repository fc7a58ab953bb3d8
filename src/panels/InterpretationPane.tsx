// The area–depth graph, the results table, scenarios, sensitivity and uncertainty (interpretation pane):
// a resizable, collapsible column on the right. Every number comes from the engine through the selectors.
import { useCallback, useMemo, useRef, useState } from 'react';
import { useDocStore } from '../state/docStore';
import { activeScenario } from '../core/model/docToSection';
import type { ProjectDoc } from '../core/model/projectDoc';
import { scenarioSetIncluded } from '../core/model/commands/scenarioSetIncluded';
import { scenarioSwitch } from '../core/model/commands/scenarioSwitch';
import { setSettings } from '../core/model/commands/setSettings';
import { twoSegmentFit } from '../core/analysis/twoSegmentFit';
import { AreaDepthGraph } from './interpretation/AreaDepthGraph';
import { Cautions } from './interpretation/Cautions';
import { DiagnosticList } from './interpretation/DiagnosticList';
import { HorizonTable } from './interpretation/HorizonTable';
import { KeyResults } from './interpretation/KeyResults';
import { MonteCarloPanel } from './interpretation/MonteCarloPanel';
import { ScenarioPanel } from './interpretation/ScenarioPanel';
import { SensitivityPanel } from './interpretation/SensitivityPanel';
import { diagnostics } from './interpretation/diagnostics';
import { formatLength } from '../format/formatQuantity';
import { tableAreaUnit } from '../format/horizonColumns';
import { outlierFlags } from './interpretation/outlierFlags';
import { useScenarioAnalysis } from './interpretation/useScenarioAnalysis';
import { scenarioColour } from './interpretation/scenarioColour';
import './interpretation/interpretation.css';

/** Whether the open project is the built-in invented demo (src/state/openDemo.ts). */
function isDemo(doc: ProjectDoc): boolean {
  return (doc.scan?.id ?? '').startsWith('scan-demo') && /demo/i.test(doc.title);
}

const MIN_WIDTH = 320;
const MAX_WIDTH = 760;

export function InterpretationPane() {
  // A quarter of the window on wide screens, so the tables have room at 1920 px; never below 420 px.
  const [width, setWidth] = useState(() => Math.round(Math.min(560, Math.max(420, (typeof window === 'undefined' ? 0 : window.innerWidth) * 0.25))));
  const [collapsed, setCollapsed] = useState(false);
  const drag = useRef<{ x: number; w: number } | null>(null);
  const onResizeDown = useCallback((e: React.PointerEvent) => {
    (e.target as HTMLElement).setPointerCapture(e.pointerId);
    drag.current = { x: e.clientX, w: width };
  }, [width]);
  const onResizeMove = useCallback((e: React.PointerEvent) => {
    if (!drag.current) return;
    setWidth(Math.min(MAX_WIDTH, Math.max(MIN_WIDTH, drag.current.w + drag.current.x - e.clientX)));
  }, []);
  const onResizeUp = useCallback(() => {
    drag.current = null;
  }, []);

  if (collapsed) {
    return (
      <aside className="interp-pane collapsed" aria-label="Interpretation">
        <button type="button" className="interp-expand" onClick={() => setCollapsed(false)} data-testid="pane-expand" title="Show the interpretation pane">
          ◂ Interpretation
        </button>
      </aside>
    );
  }
  return (
    <aside className="interp-pane" style={{ width }} aria-label="Interpretation" data-testid="interpretation-pane">
      <div className="interp-resize" role="separator" aria-orientation="vertical" aria-label="Resize the interpretation pane"
        onPointerDown={onResizeDown} onPointerMove={onResizeMove} onPointerUp={onResizeUp} onPointerCancel={onResizeUp} />
      <PaneBody onCollapse={() => setCollapsed(true)} />
    </aside>
  );
}

function PaneBody({ onCollapse }: { onCollapse: () => void }) {
  const doc = useDocStore((s) => s.doc);
  const apply = useDocStore((s) => s.apply);
  const sa = useScenarioAnalysis();
  const scenario = activeScenario(doc);
  const [dataOnly, setDataOnly] = useState(false);
  const [twoSegments, setTwoSegments] = useState(false);
  const [split, setSplit] = useState<number | null>(null);
  const { analysis, series, docSection, outcome } = sa;
  const diag = useMemo(() => diagnostics(docSection, outcome, sa.leftOut), [docSection, outcome, sa.leftOut]);
  const flags = useMemo(() => (series ? outlierFlags(series.points, series.fit.fit) : []), [series]);
  const unit = analysis ? tableAreaUnit(analysis) : null;
  const toggle = useCallback((id: string, included: boolean) => apply((d) => scenarioSetIncluded(d, id, included)), [apply]);

  // Split choices for the second segment: between consecutive included depths.
  const splits = useMemo(() => {
    if (!series) return [];
    const inc = series.points.filter((p) => p.included).sort((a, b) => a.depth - b.depth);
    return inc.slice(0, -1).map((p, i) => ({ depth: (p.depth + inc[i + 1].depth) / 2, label: `between ${p.name} and ${inc[i + 1].name}` }));
  }, [series]);
  const splitDepth = split !== null && splits.some((s) => s.depth === split) ? split : splits[Math.floor(splits.length / 2)]?.depth ?? null;
  const two = useMemo(() => {
    if (!twoSegments || !series || splitDepth === null) return null;
    const inc = series.points.filter((p) => p.included);
    return twoSegmentFit(inc.map((p) => p.depth), inc.map((p) => p.area), splitDepth, series.referenceElevation);
  }, [twoSegments, series, splitDepth]);
  const u = doc.units;

  return (
    <>
      <div className="interp-header">
        <h2>Interpretation</h2>
        <label className="scenario-pick">
          Scenario{' '}
          <select value={doc.activeScenarioId} data-testid="scenario-select" onChange={(e) => apply((d) => scenarioSwitch(d, e.target.value))}>
            {doc.scenarios.map((s) => <option key={s.id} value={s.id}>{s.name}</option>)}
          </select>
        </label>
        <button type="button" className="icon" onClick={onCollapse} title="Hide the interpretation pane" data-testid="pane-collapse">▸</button>
      </div>
      {isDemo(doc) && <p className="interp-demo" data-testid="demo-note">Invented demo — Project ▸ New to start your own.</p>}
      <div className="interp-scroll">
        <DiagnosticList items={diag} flags={flags} unit={unit} />
        {analysis && <KeyResults analysis={analysis} />}
        {series && analysis && (
          <section className="interp-section">
            <h3>Area–depth graph</h3>
            <AreaDepthGraph
              series={[{ key: scenario.id, label: scenario.name, colour: scenarioColour(doc.scenarios.indexOf(scenario)), series }]}
              units={u}
              dataOnly={dataOnly}
              interactive
              onTogglePoint={(p) => toggle(p.id, !p.included)}
              twoSegment={two}
              testId="area-depth-graph"
            />
            <div className="button-row">
              <button type="button" onClick={() => setDataOnly(!dataOnly)} data-testid="graph-zoom">{dataOnly ? 'Show the detachment' : 'Zoom to the points'}</button>
              <label className="check"><input type="checkbox" checked={doc.settings.showDetachment} data-testid="show-detachment"
                onChange={(e) => apply((d) => setSettings(d, { showDetachment: e.target.checked }))} /> On the section</label>
              <label className="check"><input type="checkbox" checked={twoSegments} onChange={(e) => setTwoSegments(e.target.checked)} data-testid="two-segment" /> Second segment (upper detachment)</label>
            </div>
            <p className="hint">Filled: in the fit; hollow: left out. Shaded: 95% band of the line; bar on the depth axis: 95% Fieller interval of the detachment. Thin lines: each point's distance off the line.</p>
            {twoSegments && (
              <div className="two-segment" data-testid="two-segment-result">
                {splits.length === 0 ? <p className="hint">Needs at least two included horizons.</p> : (
                  <label>Split{' '}
                    <select value={splitDepth ?? ''} onChange={(e) => setSplit(Number(e.target.value))}>
                      {splits.map((s) => <option key={s.depth} value={s.depth}>{s.label}</option>)}
                    </select>
                  </label>
                )}
                {two && (
                  <ul>
                    <li>Above the split: {two.upper.result ? `D = ${formatLength(two.upper.result.displacement, u)}, n = ${two.upper.result.n}` : 'no line (fewer than two horizons)'}</li>
                    <li>Below the split: {two.lower.result ? `D = ${formatLength(two.lower.result.displacement, u)}, detachment ${formatLength(two.lower.result.detachmentDepth, u)} deep, n = ${two.lower.result.n}` : 'no line (fewer than two horizons)'}</li>
                    <li>Upper detachment: {two.upperDisplacement !== null ? `displacement ${formatLength(two.upperDisplacement, u)}` : '—'}
                      {two.upperDetachmentDepth !== null ? `, depth ${formatLength(two.upperDetachmentDepth, u)} (elevation ${formatLength(two.upperDetachmentElevation, u)})` : ''}</li>
                    {two.notes.map((n) => <li key={n} className="hint">{n}</li>)}
                  </ul>
                )}
              </div>
            )}
          </section>
        )}
        {analysis && (
          <section className="interp-section">
            <h3>Results per horizon</h3>
            <HorizonTable analysis={analysis} horizonIds={sa.horizonIds} flagged={new Set(flags.map((f) => f.id))} onToggle={toggle} />
          </section>
        )}
        <details className="interp-section" open>
          <summary>Scenarios</summary>
          <ScenarioPanel />
        </details>
        {docSection.ok && analysis && (
          <details className="interp-section" data-testid="sensitivity-section">
            <summary>Sensitivity to the regional</summary>
            <SensitivityPanel scenarioId={scenario.id} section={docSection.section} prepared={sa.prepared} />
          </details>
        )}
        {docSection.ok && analysis && (
          <details className="interp-section" data-testid="monte-carlo-section">
            <summary>Uncertainty (Monte Carlo)</summary>
            <MonteCarloPanel scenarioId={scenario.id} section={docSection.section} />
          </details>
        )}
        {analysis && <p className="hint">Reference elevation for depths: {formatLength(analysis.referenceElevation, u)} ({scenario.referenceElevation !== undefined ? 'set for this scenario' : 'the highest regional'}).</p>}
        <Cautions />
      </div>
    </>
  );
}

// The area–depth graph, the results table, scenarios, sensitivity and uncertainty (interpretation pane):
// a resizable, collapsible column on the right. Every number comes from the engine through the selectors.
import { useCallback, useMemo, useRef, useState, useSyncExternalStore } from 'react';
import { useDocStore } from '../state/docStore';
import { activeScenario } from '../core/model/docToSection';
import type { ProjectDoc } from '../core/model/projectDoc';
import { scenarioSetIncluded } from '../core/model/commands/scenarioSetIncluded';
import { scenarioSwitch } from '../core/model/commands/scenarioSwitch';
import { setSettings } from '../core/model/commands/setSettings';
import { AreaDepthGraph } from './interpretation/AreaDepthGraph';
import { graphFit, graphFrame, unionFrame, type GraphFrame, type GraphSeriesSpec } from './interpretation/graphLayer';
import type { AreaDepthSeries } from './interpretation/areaDepthSeries';
import { useCrossingChecks } from '../state/crossingChecks';
import { Cautions } from './interpretation/Cautions';
import { DiagnosticList } from './interpretation/DiagnosticList';
import { HorizonTable } from './interpretation/HorizonTable';
import { KeyResults } from './interpretation/KeyResults';
import { MonteCarloPanel } from './interpretation/MonteCarloPanel';
import { ScenarioPanel } from './interpretation/ScenarioPanel';
import { SensitivityPanel } from './interpretation/SensitivityPanel';
import { diagnostics } from './interpretation/diagnostics';
import { formatLength } from '../format/formatQuantity';
import { fitNotes } from '../format/analysisNotes';
import { tableAreaUnit } from '../format/horizonColumns';
import { outlierFlags } from './interpretation/outlierFlags';
import { liveScenarioAnalysis, useScenarioAnalysis, type ScenarioAnalysis } from './interpretation/useScenarioAnalysis';
import { useShownDoc, type ShownDoc } from '../state/shownDoc';
import { LiveText, useLiveShape, type LiveRead } from './liveText';
import type { Diagnostic } from './interpretation/diagnostics';
import type { OutlierFlag } from './interpretation/outlierFlags';
import type { AreaUnit } from '../format/formatQuantity';
import type { GraphPoint } from './interpretation/areaDepthSeries';
import { twoSegmentFit, type TwoSegmentFit } from '../core/analysis/twoSegmentFit';
import { scenarioColour } from '../core/model/horizonPalette';
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

/** The pane's diagnostics and flagged horizons of a scenario analysis, made once per analysis (the live texts read them). */
const readings = new WeakMap<ScenarioAnalysis, { diag: Diagnostic[]; flags: OutlierFlag[]; unit: AreaUnit | null }>();
function paneReading(sa: ScenarioAnalysis): { diag: Diagnostic[]; flags: OutlierFlag[]; unit: AreaUnit | null } {
  const hit = readings.get(sa);
  if (hit) return hit;
  const r = {
    diag: diagnostics(sa.docSection, sa.outcome, sa.leftOut),
    flags: sa.series ? outlierFlags(sa.series.points, sa.series.fit.fit) : [],
    unit: sa.analysis ? tableAreaUnit(sa.analysis) : null,
  };
  readings.set(sa, r);
  return r;
}
const paneOf = (doc: ProjectDoc, gs: ProjectDoc | null) => paneReading(liveScenarioAnalysis(doc, gs));

/**
 * What the pane's live texts cannot change: which parts are shown, and which diagnostics (by key: a diagnostic that
 * appears or goes mid-drag renders the pane, so none shows a number from the gesture's start). The horizons flagged
 * as far off the line are judged again when the gesture ends; meanwhile their distances follow where the same stand.
 */
function paneShape(doc: ProjectDoc, gs: ProjectDoc | null): string {
  const sa = liveScenarioAnalysis(doc, gs);
  return [Boolean(sa.analysis), Boolean(sa.series), sa.docSection.ok, ...paneReading(sa).diag.map((d) => `${d.level} ${d.key}`)].join('\n');
}

const referenceRead: LiveRead = (doc, gs) => {
  const a = liveScenarioAnalysis(doc, gs).analysis;
  const scenario = activeScenario(doc);
  return a && `Reference elevation for depths: ${formatLength(a.referenceElevation, doc.units)} (${scenario.referenceElevation !== undefined ? 'set for this scenario' : 'the highest regional'}).`;
};

const graphSpecs = new WeakMap<AreaDepthSeries, GraphSeriesSpec[]>();

/** The pane graph's series for a document (made once per analysis, so a held graph keeps the same object). */
function graphSpecsOf(doc: ProjectDoc, gs: ProjectDoc | null): GraphSeriesSpec[] | null {
  const { series } = liveScenarioAnalysis(doc, gs);
  if (!series) return null;
  const hit = graphSpecs.get(series);
  if (hit) return hit;
  const scenario = activeScenario(doc);
  const specs = [{ key: scenario.id, label: scenario.name, colour: scenarioColour(doc.scenarios.indexOf(scenario)), series }];
  graphSpecs.set(series, specs);
  return specs;
}

interface GraphDoc extends ShownDoc {
  /** The axes kept during a gesture; null: the graph's own. */
  frame: GraphFrame | null;
}

/**
 * The store's document as the pane's graph renders it. During a gesture, the one last rendered, while the store's
 * graph fits in its axes (graphShape): its moves are drawn on the graph's canvas layer instead; when it does not, the
 * store's, in axes widened to take it (unionFrame). Unless `hold` is false: then every move renders.
 */
function useGraphDoc(hold: boolean, dataOnly: boolean): GraphDoc {
  const held = useRef<GraphDoc | null>(null);
  const get = useCallback((): GraphDoc => {
    const { doc, gestureStart } = useDocStore.getState();
    const h = held.current;
    if (h && h.doc === doc && h.gestureStart === gestureStart) return h;
    const specs = graphSpecsOf(doc, gestureStart);
    const heldSpecs = h && graphSpecsOf(h.doc, h.gestureStart);
    const heldFrame = h && (h.frame ?? graphFrameOf(heldSpecs, dataOnly, h.doc.units));
    if (hold && gestureStart && h && heldFrame && heldSpecs && specs && h.doc.units === doc.units) {
      const now = graphFit(specs, heldFrame, dataOnly, doc.units);
      const was = graphFit(heldSpecs, heldFrame, dataOnly, doc.units);
      const own = graphFrameOf(specs, dataOnly, doc.units);
      if (now && was && own && now.parts === was.parts) {
        if (now.within) return h;
        return (held.current = { doc, gestureStart, frame: unionFrame(heldFrame, own, GRAPH_HEIGHT) });
      }
    }
    return (held.current = { doc, gestureStart, frame: null });
  }, [hold, dataOnly]);
  return useSyncExternalStore(useDocStore.subscribe, get, get);
}

/**
 * The area–depth graph of the store's document: while a regional is dragged its points and line follow on the
 * graph's canvas layer, and the graph renders only when its axes or parts change (the rest of the pane holds still
 * and its numbers are live texts). With the second segment shown every move renders the graph.
 */
function LiveGraph({ dataOnly, onTogglePoint, twoSegment }: { dataOnly: boolean; onTogglePoint: (p: GraphPoint) => void; twoSegment: TwoSegmentFit | null }) {
  const hold = twoSegment === null;
  const { doc, gestureStart, frame } = useGraphDoc(hold, dataOnly);
  // A self-crossing verdict changes the analysis of the same document (crossingChecks.ts): render it then.
  useCrossingChecks((s) => s.answered);
  const specs = graphSpecsOf(doc, gestureStart);
  if (!specs) return null;
  return (
    <AreaDepthGraph
      series={specs}
      units={doc.units}
      dataOnly={dataOnly}
      interactive
      onTogglePoint={onTogglePoint}
      twoSegment={twoSegment}
      testId="area-depth-graph"
      height={GRAPH_HEIGHT}
      follow={hold ? { doc, read: graphSpecsOf, frame } : undefined}
    />
  );
}

const GRAPH_HEIGHT = 300;
const graphFrames = new WeakMap<GraphSeriesSpec[], { dataOnly: boolean; units: string; frame: GraphFrame | null }>();

/** The axes the pane's graph renders for its series (made once per series, zoom and units). */
function graphFrameOf(specs: GraphSeriesSpec[] | null, dataOnly: boolean, units: string): GraphFrame | null {
  if (!specs) return null;
  const hit = graphFrames.get(specs);
  if (hit && hit.dataOnly === dataOnly && hit.units === units) return hit.frame;
  const frame = graphFrame(specs, dataOnly, units, GRAPH_HEIGHT);
  graphFrames.set(specs, { dataOnly, units, frame });
  return frame;
}

function PaneBody({ onCollapse }: { onCollapse: () => void }) {
  const { doc } = useShownDoc();
  const apply = useDocStore((s) => s.apply);
  const sa = useScenarioAnalysis();
  const scenario = activeScenario(doc);
  const [dataOnly, setDataOnly] = useState(false);
  const [twoSegments, setTwoSegments] = useState(false);
  const [split, setSplit] = useState<number | null>(null);
  const { analysis, series, docSection } = sa;
  const { diag, flags, unit } = paneReading(sa);
  useLiveShape(paneShape);
  // The second segment's numbers are not live texts: with it shown, a drag renders the pane each frame.
  useLiveShape((d, gs) => (twoSegments ? liveScenarioAnalysis(d, gs).series?.points.map((p) => `${p.area} ${p.depth}`).join(',') ?? '' : ''));
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
        <DiagnosticList items={diag} flags={flags} unit={unit} read={paneOf} />
        {analysis && <KeyResults />}
        {series && analysis && (
          <section className="interp-section">
            <h3>Area–depth graph</h3>
            <LiveGraph dataOnly={dataOnly} onTogglePoint={(p) => toggle(p.id, !p.included)} twoSegment={two} />
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
                    {[...new Set([...two.notes, ...fitNotes(two.upper.result), ...fitNotes(two.lower.result)])].map((n) => <li key={n} className="hint">{n}</li>)}
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
        {analysis && <LiveText as="p" className="hint" read={referenceRead} />}
        <Cautions />
      </div>
    </>
  );
}

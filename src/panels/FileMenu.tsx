// Project save/open, imports and exports (files and reports), and the autosave banners.
import { useEffect, useRef, useState } from 'react';
import { selectAnalysis } from '../state/selectors';
import { afterLinesChecked } from '../state/linesChecked';
import { shownRevision, useDocStore } from '../state/docStore';
import { useSessionStore } from '../state/sessionStore';
import { useTabStore } from '../state/tabLock';
import { useAutosaveStatus } from '../state/autosaveStatus';
import { downloadFile, safeFileName } from '../io/downloadFile';
import { markPngStep, prepareFigurePng, startFigurePng, PNG_SIZES, type FigurePngJob, type PngStep } from '../io/exportFigure';
import { currentFigureParts, currentFigureSvgBlob, prepareCurrentFigure } from '../state/currentFigureSvg';
import { currentUncertainty } from '../state/currentUncertainty';
import { busyProgress } from '../state/busyProgress';
import { docFaultsInSection, docHorizonsInSection, resultsCsv, sectionFileText } from '../io/exportTables';
import { writeHorizonsCsv } from '../io/csvHorizons';
import { writeHorizonsGeoJson } from '../io/geojsonHorizons';
import { newProject, openProjectFile, saveProjectFile, unsavedChangesMayGo } from '../state/projectActions';
import { DEMOS, openDemo, type DemoId } from '../state/openDemo';
import { ImportDialog } from './files/ImportDialog';
import { ProjectInfoDialog } from './files/ProjectInfoDialog';
import { readImport, type ImportKind, type PendingImport } from './files/readImport';
import { ReportPage } from './files/ReportPage';
import { StorageBanner } from './files/StorageBanner';
import './files/files.css';

type MenuId = 'project' | 'import' | 'export' | null;


function exportText(text: string | null, type: string, ext: string, empty: string): void {
  const { doc } = useDocStore.getState();
  if (text === null) {
    useSessionStore.getState().showMessage('error', empty);
    return;
  }
  downloadFile(new Blob([text], { type }), safeFileName(doc.title, ext));
}

/** Exports the figure as SVG, the scan embedded once (written piece by piece: a scan file of any size). */
async function exportSvg(): Promise<void> {
  if (!(await afterLinesChecked('The SVG'))) return;
  const session = useSessionStore.getState();
  session.setBusy('SVG: embedding the scan …');
  try {
    downloadFile(await currentFigureSvgBlob(), safeFileName(useDocStore.getState().doc.title, '.svg'));
  } catch (e) {
    session.showMessage('error', `The SVG could not be written: ${e instanceof Error ? e.message : String(e)}`);
  } finally {
    session.setBusy(null);
  }
}

/** The PNG export under way, if any: one at a time. */
let pngJob: FigurePngJob | null = null;

async function exportPng(sizeId: string): Promise<void> {
  if (pngJob) return;
  markPngStep('asked');
  if (!(await afterLinesChecked('The PNG'))) return;
  if (pngJob) return;
  const size = PNG_SIZES.find((s) => s.id === sizeId) ?? PNG_SIZES[0];
  const session = useSessionStore.getState();
  const steps: Record<PngStep, string> = { 'scan-region': 'taking the scan region', figure: 'drawing the figure', scan: 'drawing the scan', labels: 'drawing the lines and labels', encoding: 'encoding the PNG' };
  const order = Object.keys(steps) as PngStep[];
  const cancel = () => pngJob?.cancel();
  // A step at the small sizes lasts a few milliseconds: the message follows at most five times a second.
  const progress = busyProgress((text, work) => session.setBusy(text, work));
  const say = (step: PngStep) => progress.say(`PNG ${size.width} × ${size.height} px: ${steps[step]} …`, { done: order.indexOf(step) / order.length, cancel });
  say('figure');
  try {
    const { parts, scan } = currentFigureParts();
    pngJob = startFigurePng(parts, scan, size.width, size.height, say);
    const png = await pngJob.done;
    if (png.ok) {
      downloadFile(png.blob, safeFileName(useDocStore.getState().doc.title, '.png'));
      markPngStep('handed');
    }
    else if (png.cancelled) session.showMessage('info', `PNG export cancelled; nothing was saved.`);
    else session.showMessage('error', png.message);
  } finally {
    pngJob = null;
    progress.stop();
    session.setBusy(null);
  }
}

/** The results table (CSV) of the active scenario, once its long lines are checked. */
async function exportResultsCsv(): Promise<void> {
  if (!(await afterLinesChecked('The results table'))) return;
  const { doc } = useDocStore.getState();
  exportText(resultsCsv(doc, selectAnalysis(doc), currentUncertainty(doc)), 'text/csv', '-results.csv', 'No results to export yet: place the pins and draw regionals for at least one horizon.');
}

/** The section file for the command line (the horizons the analysis keeps, and which it leaves out), once the long lines are checked. */
async function exportSectionFile(): Promise<void> {
  if (!(await afterLinesChecked('The section file'))) return;
  const r = sectionFileText(selectAnalysis(useDocStore.getState().doc));
  exportText(r.ok ? r.text : null, 'application/json', '-section.json', r.ok ? '' : r.message);
}

function horizonsOrNull(kind: 'csv' | 'geojson'): string | null {
  const doc = useDocStore.getState().doc;
  const hs = docHorizonsInSection(doc);
  const fs = docFaultsInSection(doc);
  if (hs.length === 0 && fs.length === 0) return null;
  return kind === 'csv' ? writeHorizonsCsv(hs, doc.units, fs) : writeHorizonsGeoJson(hs, doc.units, fs);
}

export function FileMenu() {
  const [menu, setMenu] = useState<MenuId>(null);
  const [pending, setPending] = useState<PendingImport | null>(null);
  const [report, setReport] = useState(false);
  const [info, setInfo] = useState(false);
  const [pngSize, setPngSize] = useState<string>('a4-150');
  const figureVe = useSessionStore((s) => s.figureVerticalExaggeration);
  const lastSaved = useAutosaveStatus((s) => s.lastSavedAt);
  // Both read the revision as the gesture began while one is under way (shownRevision): they turn at its end.
  const dirty = useDocStore((s) => shownRevision(s) !== s.savedRevision);
  // Whether the kept revision is the document's, selected as one flag: a drag bumps the revision every frame, and
  // the menu renders only when the flag turns.
  const keptRevision = useAutosaveStatus((s) => s.keptRevision);
  const kept = useDocStore((s) => shownRevision(s) === keptRevision);
  const readOnly = useTabStore((s) => s.role === 'read-only');
  const shownKeptAt = useTabStore((s) => s.shownKeptAt);
  const openRef = useRef<HTMLInputElement>(null);
  const importRefs = { csv: useRef<HTMLInputElement>(null), geojson: useRef<HTMLInputElement>(null), svg: useRef<HTMLInputElement>(null) };
  const rootRef = useRef<HTMLDivElement>(null);

  useEffect(() => {
    if (!menu) return;
    const close = (e: PointerEvent) => {
      if (!rootRef.current?.contains(e.target as Node)) setMenu(null);
    };
    window.addEventListener('pointerdown', close);
    return () => window.removeEventListener('pointerdown', close);
  }, [menu]);

  const choose = (action: () => void) => () => {
    setMenu(null);
    action();
  };
  const onImportFile = (kind: ImportKind) => async (e: React.ChangeEvent<HTMLInputElement>) => {
    const file = e.currentTarget.files?.[0];
    e.currentTarget.value = '';
    if (!file) return;
    // Read and parsed in a worker (panels/files/readImport): the busy bar shows the stage and offers a Cancel.
    const session = useSessionStore.getState();
    const stop = new AbortController();
    const busy = (stage: string, done: number | null = null) => session.setBusy(`Reading ${file.name} … ${stage}`, { done, cancel: () => stop.abort() });
    busy('reading');
    try {
      const read = await readImport(kind, file, (p) => (p.stage === 'lines' ? busy('lines', p.fraction) : busy(p.stage)), stop.signal);
      if (read) setPending(read);
      else session.showMessage('info', `Reading ${file.name} was cancelled; nothing was imported.`);
    } finally {
      session.setBusy(null);
    }
  };
  const toggle = (id: MenuId) => () => setMenu((m) => (m === id ? null : id));

  return (
    <div className="file-menu" ref={rootRef}>
      <input ref={openRef} type="file" hidden data-testid="open-project" accept=".json,.foldroot,application/json"
        onChange={(e) => {
          const file = e.currentTarget.files?.[0];
          e.currentTarget.value = '';
          if (file) void openProjectFile(file);
        }} />
      <input ref={importRefs.csv} type="file" hidden data-testid="import-csv" accept=".csv,text/csv,text/plain" onChange={(e) => void onImportFile('csv')(e)} />
      <input ref={importRefs.geojson} type="file" hidden data-testid="import-geojson" accept=".geojson,.json,application/geo+json" onChange={(e) => void onImportFile('geojson')(e)} />
      <input ref={importRefs.svg} type="file" hidden data-testid="import-svg" accept=".svg,image/svg+xml" onChange={(e) => void onImportFile('svg')(e)} />

      <div className="menu">
        <button type="button" aria-haspopup="menu" aria-expanded={menu === 'project'} onClick={toggle('project')} data-testid="menu-project">Project ▾</button>
        {menu === 'project' && (
          <div className="menu-list" role="menu">
            <button type="button" role="menuitem" onClick={choose(newProject)}>New</button>
            <button type="button" role="menuitem" onClick={choose(() => openRef.current?.click())}>Open… <span className="hint">project or section file</span></button>
            <button type="button" role="menuitem" onClick={choose(() => void saveProjectFile())} data-testid="save-project">Save…</button>
            <hr />
            <span className="hint">Invented examples</span>
            {(Object.keys(DEMOS) as DemoId[]).map((id) => (
              <button key={id} type="button" role="menuitem" data-testid={`open-example-${id}`}
                onClick={choose(() => { if (unsavedChangesMayGo('Discard the changes not saved to a file and open the example?')) void openDemo(id); })}>{DEMOS[id].label}</button>
            ))}
            <hr />
            <button type="button" role="menuitem" onClick={choose(() => setInfo(true))} data-testid="menu-project-info">Title and author…</button>
          </div>
        )}
      </div>
      <div className="menu">
        <button type="button" aria-haspopup="menu" aria-expanded={menu === 'import'} onClick={toggle('import')} data-testid="menu-import">Import ▾</button>
        {menu === 'import' && (
          <div className="menu-list" role="menu">
            <button type="button" role="menuitem" onClick={choose(() => importRefs.csv.current?.click())}>Horizons from CSV…</button>
            <button type="button" role="menuitem" onClick={choose(() => importRefs.geojson.current?.click())}>Horizons from GeoJSON…</button>
            <button type="button" role="menuitem" onClick={choose(() => importRefs.svg.current?.click())}>Horizons from an SVG drawing…</button>
          </div>
        )}
      </div>
      <div className="menu">
        <button type="button" aria-haspopup="menu" aria-expanded={menu === 'export'} onClick={() => { if (menu !== 'export') { prepareFigurePng(); prepareCurrentFigure(); } setMenu((m) => (m === 'export' ? null : 'export')); }} data-testid="menu-export">Export ▾</button>
        {menu === 'export' && (
          <div className="menu-list" role="menu">
            <button type="button" role="menuitem" data-testid="export-project-info" onClick={choose(() => setInfo(true))}>Title and author… <span className="hint">for the figure and report</span></button>
            <hr />
            <label className="menu-field">
              Figure scale
              <select data-testid="figure-ve" value={figureVe === null ? 'scan' : String(figureVe)}
                onChange={(e) => { const v = e.currentTarget.value; useSessionStore.getState().setFigureVerticalExaggeration(v === 'scan' ? null : Number(v)); }}>
                <option value="scan">as on the scan</option>
                <option value="1">true scale (VE 1×)</option>
                {[2, 3, 5, 10].map((v) => <option key={v} value={String(v)}>vertical exaggeration {v}×</option>)}
              </select>
            </label>
            <button type="button" role="menuitem" data-testid="export-svg" onClick={choose(() => void exportSvg())}>Section figure as SVG</button>
            <label className="menu-field">
              PNG size
              <select data-testid="png-size" value={pngSize} onChange={(e) => setPngSize(e.currentTarget.value)}>
                {PNG_SIZES.map((s) => <option key={s.id} value={s.id}>{s.label}</option>)}
              </select>
            </label>
            <button type="button" role="menuitem" data-testid="export-png" onClick={choose(() => void exportPng(pngSize))}>Section figure as PNG</button>
            <hr />
            <button type="button" role="menuitem" data-testid="export-results-csv"
              onClick={choose(() => void exportResultsCsv())}>Results table (CSV)</button>
            <button type="button" role="menuitem" data-testid="export-horizons-csv" onClick={choose(() => exportText(horizonsOrNull('csv'), 'text/csv', '-horizons.csv', 'No calibrated horizons to export yet.'))}>Horizons (CSV)</button>
            <button type="button" role="menuitem" data-testid="export-horizons-geojson" onClick={choose(() => exportText(horizonsOrNull('geojson'), 'application/geo+json', '-horizons.geojson', 'No calibrated horizons to export yet.'))}>Horizons (GeoJSON)</button>
            <button type="button" role="menuitem" data-testid="export-section-file"
              onClick={choose(() => void exportSectionFile())}>Section file for the command line</button>
          </div>
        )}
      </div>
      <button type="button" onClick={() => { setMenu(null); void afterLinesChecked('The report', 'all').then((ok) => ok && setReport(true)); }} data-testid="open-report">Report</button>
      {readOnly
        // A read-only tab keeps nothing and saves nothing: it says whose work it shows, never "Saved".
        ? <span className="autosave-state read-only" data-testid="autosave-status" title="Another tab of this browser edits this project; this tab shows what that tab keeps">
            Read-only · another tab edits{shownKeptAt ? ` · its work as kept at ${new Date(shownKeptAt).toLocaleTimeString()}` : ''}
          </span>
        : <span className="autosave-state" data-testid="autosave-status" title={lastSaved ? `Kept in this browser at ${new Date(lastSaved).toLocaleTimeString()}` : 'Not yet kept in this browser'}>
            {dirty ? 'Unsaved changes' : 'Saved'}{kept ? ' · kept in browser' : ''}
          </span>}
      <StorageBanner />
      {pending && <ImportDialog pending={pending} onClose={() => setPending(null)} />}
      {report && <ReportPage onClose={() => setReport(false)} onEditInfo={() => setInfo(true)} />}
      {info && <ProjectInfoDialog onClose={() => setInfo(false)} />}
    </div>
  );
}

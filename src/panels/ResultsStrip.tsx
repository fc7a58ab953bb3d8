// The compact live results beside the section (section workspace): each horizon's excess area and the
// detachment depth and displacement of the area–depth line, following every drag (liveResults: a reading of the one live analysis the pane and exports read). The full
// caution (docs/method.md §Cautions) stands beside them in small type: the strip may be the only result on screen.
import { SECTION_CAUTION } from '../core/analysis/caution';
import type { ProjectDoc } from '../core/model/projectDoc';
import { useShownDoc } from '../state/shownDoc';
import { useSessionStore } from '../state/sessionStore';
import { useCrossingChecks } from '../state/crossingChecks';
import { formatArea, formatLength } from '../format/formatQuantity';
import { liveResults } from './workspace/liveResults';
import { LiveText, useLiveShape, type LiveRead } from './liveText';
import './workspace/workspace.css';

/** The strip's numbers of a document, as its live texts read them. */
const strip = (doc: ProjectDoc, gestureStart: ProjectDoc | null) => liveResults(doc, gestureStart);
const depthText: LiveRead = (doc, gs) => {
  const live = strip(doc, gs);
  return !live.ready ? null : live.detachmentDepth === null ? '—' : formatLength(live.detachmentDepth, live.units);
};
const elevationText: LiveRead = (doc, gs) => {
  const live = strip(doc, gs);
  return !live.ready ? null : live.detachmentElevation === null ? ''
    : `below ${formatLength(live.referenceElevation, live.units)} (elevation ${formatLength(live.detachmentElevation, live.units)})`;
};
const regimeText: LiveRead = (doc, gs) => {
  const live = strip(doc, gs);
  return !live.ready ? null : live.regime ?? '';
};
const noteText: LiveRead = (doc, gs) => {
  const live = strip(doc, gs);
  return !live.ready ? null : live.note ?? '';
};
const displacementText: LiveRead = (doc, gs) => {
  const live = strip(doc, gs);
  return !live.ready ? null : live.displacement === null || live.noDetachment ? '—' : formatLength(live.displacement, live.units);
};
const areaText = (id: string): LiveRead => (doc, gs) => {
  const live = strip(doc, gs);
  const h = live.horizons.find((k) => k.id === id);
  return !h ? null : h.excessArea === null ? '—' : live.ready ? formatArea(h.excessArea, live.units, live.areaUnit) : '—';
};

/**
 * What of the strip its live texts cannot change: whether it has numbers, and each horizon's button (a button's
 * hover text, which names why a horizon is left out, follows when the gesture ends).
 */
function stripShape(doc: ProjectDoc, gestureStart: ProjectDoc | null): string {
  const live = strip(doc, gestureStart);
  const buttons = live.horizons.map((h) => `${h.id} ${h.name} ${h.colour} ${h.included}`).join('\n');
  return live.ready ? buttons : `${live.message}\n${buttons}`;
}

export function ResultsStrip() {
  const { doc, gestureStart } = useShownDoc();
  const selectHorizon = useSessionStore((s) => s.selectHorizon);
  const selectedId = useSessionStore((s) => s.selectedHorizonId);
  const checking = useCrossingChecks((s) => s.pending > 0);
  useLiveShape(stripShape);
  const shown = !(doc.horizons.length === 0 && !doc.calibration);
  // The strip keeps its place and height below the view even before there is anything to show, so the view's
  // size never changes while the user calibrates or draws.
  if (!shown) {
    return (
      <div className="results-strip" data-testid="results-strip" aria-label="Live results">
        <span className="strip-note" data-testid="strip-note">Results appear here once the scan is calibrated and horizons, pins and regionals are drawn.</span>
        <p className="strip-caution" data-testid="strip-caution">{SECTION_CAUTION}</p>
      </div>
    );
  }
  const live = strip(doc, gestureStart);
  // The numbers sit in boxes of a fixed size (workspace.css .strip-number): a drag changes their text every frame,
  // and a box that kept its size lays out alone instead of the page.
  return (
    <div className="results-strip" data-testid="results-strip" aria-label="Live results">
      <div className="strip-main">
        {live.ready ? (
          <>
            <span className="strip-figure">
              <span className="strip-label">Detachment depth</span>
              <LiveText as="strong" className="strip-number" testId="strip-detachment-depth" read={depthText} />
              {/* Kept while empty (no detachment), so that a drag that loses and finds the detachment moves nothing else. */}
              <LiveText className="strip-aside strip-number wide" testId="strip-detachment-elevation" read={elevationText} />
            </span>
            <span className="strip-figure">
              <span className="strip-label">Displacement</span>
              <LiveText as="strong" className="strip-number" testId="strip-displacement" read={displacementText} />
              <LiveText className="strip-aside" testId="strip-regime" read={regimeText} />
            </span>
            <LiveText className="strip-note" testId="strip-note" read={noteText} />
            {checking && <span className="strip-note" data-testid="strip-crossing-check">Checking that the long lines do not cross themselves… (the numbers stand unless one does)</span>}
          </>
        ) : (
          <span className="strip-note" data-testid="strip-note">{live.message}</span>
        )}
      </div>
      {live.horizons.length > 0 && (
        <div className="strip-areas" aria-label="Excess area per horizon">
          {live.horizons.map((h) => (
            <button type="button" key={h.id} className={`strip-area${h.id === selectedId ? ' selected' : ''}${h.included ? '' : ' excluded'}`} onClick={() => selectHorizon(h.id)} title={h.leftOutReason ? `${h.name} is left out of the analysis: ${h.leftOutReason}` : `Excess area of ${h.name}${h.included ? '' : ' (left out of the fit)'}`}>
              <span className="swatch" style={{ background: h.colour }} />
              <span className="strip-area-name">{h.name}</span>
              <LiveText className="strip-number area" testId={`strip-area-${h.id}`} read={areaText(h.id)} />
            </button>
          ))}
        </div>
      )}
      <p className="strip-caution" data-testid="strip-caution">{SECTION_CAUTION}</p>
    </div>
  );
}

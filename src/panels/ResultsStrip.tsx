// The compact live results beside the section (section workspace): each horizon's excess area and the
// detachment depth and displacement of the area–depth line, following every drag (liveResults: a reading of the one live analysis the pane and exports read). The full
// caution (docs/method.md §Cautions) stands beside them in small type: the strip may be the only result on screen.
import { SECTION_CAUTION } from '../core/analysis/caution';
import { useDocStore } from '../state/docStore';
import { useSessionStore } from '../state/sessionStore';
import { useCrossingChecks } from '../state/crossingChecks';
import { formatArea, formatLength } from '../format/formatQuantity';
import { liveResults } from './workspace/liveResults';
import './workspace/workspace.css';

export function ResultsStrip() {
  const doc = useDocStore((s) => s.doc);
  const gestureStart = useDocStore((s) => s.gestureStart);
  const selectHorizon = useSessionStore((s) => s.selectHorizon);
  const selectedId = useSessionStore((s) => s.selectedHorizonId);
  const checking = useCrossingChecks((s) => s.pending > 0);
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
  const live = liveResults(doc, gestureStart);
  return (
    <div className="results-strip" data-testid="results-strip" aria-label="Live results">
      <div className="strip-main">
        {live.ready ? (
          <>
            <span className="strip-figure">
              <span className="strip-label">Detachment depth</span>
              <strong data-testid="strip-detachment-depth">{live.detachmentDepth === null ? '—' : formatLength(live.detachmentDepth, live.units)}</strong>
              {live.detachmentElevation !== null && (
                <span className="strip-aside" data-testid="strip-detachment-elevation">below {formatLength(live.referenceElevation, live.units)} (elevation {formatLength(live.detachmentElevation, live.units)})</span>
              )}
            </span>
            <span className="strip-figure">
              <span className="strip-label">Displacement</span>
              <strong data-testid="strip-displacement">{live.displacement === null || live.noDetachment ? '—' : formatLength(live.displacement, live.units)}</strong>
              {live.regime && <span className="strip-aside" data-testid="strip-regime">{live.regime}</span>}
            </span>
            {live.note && <span className="strip-note" data-testid="strip-note">{live.note}</span>}
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
              <span data-testid={`strip-area-${h.id}`}>{h.excessArea === null ? '—' : live.ready ? formatArea(h.excessArea, live.units, live.areaUnit) : '—'}</span>
            </button>
          ))}
        </div>
      )}
      <p className="strip-caution" data-testid="strip-caution">{SECTION_CAUTION}</p>
    </div>
  );
}

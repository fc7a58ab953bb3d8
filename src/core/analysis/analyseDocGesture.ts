// The one live analysis of a project document: every view (results strip, interpretation pane, area–depth
// graph, detachment line) and every export reads it, so they cannot disagree. Outside a gesture it is
// analyseDocSection of the document's section: a horizon with a bad line or regional is left out, with the
// reason, and the rest is analysed. While a gesture moves only regionals, the gesture's start is prepared
// once (validated, clipped, measured, with the same horizons left out) and each step re-measures only the
// moved regionals: the loop area changes by exactly −W0·Δr (the shoelace loop splits into the horizon part
// and −∫ regional dx over the pins = −W0·r; docs/method.md §Pins, regional and excess area), the
// regional length and elevation are those of the new clipped regional, and analysePrepared gives what
// analyseSection would. Whatever the fast step cannot vouch for — a moved regional that misses or folds
// back over a pin (and so may cross itself), a left-out horizon's regional moved, anything but regionals
// changed — returns null, and the caller takes the full analysis, which leaves that horizon out and says why.
import { imageToSection } from '../calibration/mapPoints';
import { clipPolylineToPins } from '../geometry/clipPolylineToPins';
import { meanElevation } from '../geometry/meanElevation';
import { lengthBeyondSpan } from '../geometry/lengthBeyondSpan';
import { polylineLength } from '../geometry/polylineLength';
import { activeScenario, docToSection, type DocSection } from '../model/docToSection';
import type { ProjectDoc, Scenario } from '../model/projectDoc';
import { analyseDocSection, type DocAnalysis, type LeftOutHorizon } from './analyseDocSection';
import { analysePrepared } from './analyseSection';
import type { PreparationBuffer } from './preparationBuffer';
import { prepareSection, type PreparedSection } from './prepareSection';
import { projectedContribution } from './projectedContribution';

/** A gesture's start, prepared once: the analysed (reduced) section, its preparation and the horizons left out. */
export interface DocGestureBase {
  scenario: Scenario;
  docSection: Extract<DocSection, { ok: true }>;
  prepared: PreparedSection;
  leftOut: LeftOutHorizon[];
}

/** Returns the analysis of the document's active (or given) scenario: analyseDocSection of its section (`buffer` as there). */
export function analyseDoc(doc: ProjectDoc, scenarioId?: string, buffer?: PreparationBuffer): DocAnalysis {
  return analyseDocSection(docToSection(doc, scenarioId), buffer);
}

/**
 * Returns the prepared start of a gesture from its analysis (`analyseDoc(start)`), or null when it has no analysis
 * to follow: the analysis's own preparation when it carries one, else the section prepared again (`buffer` holds only
 * the validated input while it runs).
 */
export function prepareDocGesture(start: ProjectDoc, startAnalysis: DocAnalysis, buffer?: PreparationBuffer): DocGestureBase | null {
  const ds = startAnalysis.docSection;
  if (!ds.ok || !startAnalysis.outcome?.ok || ds.section.horizons.length === 0) return null;
  const prep = startAnalysis.prepared ? { ok: true as const, prepared: startAnalysis.prepared } : prepareSection(ds.section, {}, buffer);
  if (!prep.ok) return null;
  return { scenario: activeScenario(start), docSection: ds, prepared: prep.prepared, leftOut: startAnalysis.leftOut };
}

/**
 * Returns the analysis of `doc` computed from the prepared gesture start when `doc` differs from the
 * start in the active scenario's regionals only (same numbers as analyseDoc(doc), to rounding), or null
 * when it cannot vouch for the fast result (then use analyseDoc).
 */
export function analyseDocGesture(doc: ProjectDoc, start: ProjectDoc, base: DocGestureBase): DocAnalysis | null {
  if (!sameExceptRegionals(doc, start, base)) return null;
  const { docSection, prepared: p } = base;
  const scenario = activeScenario(doc);
  for (const h of base.leftOut) if (scenario.regionals[h.id] !== base.scenario.regionals[h.id]) return null;
  const [pL, pR] = p.pins;
  const sectionHorizons = docSection.section.horizons.slice();
  const horizons = p.horizons.slice();
  const areas = Float64Array.from(p.areas);
  const elevations = Float64Array.from(p.regionalElevations);
  for (let i = 0; i < horizons.length; i++) {
    const id = docSection.horizonIds[i];
    const px = scenario.regionals[id];
    if (px === base.scenario.regionals[id]) continue;
    const regional = px.map((q) => imageToSection(docSection.fit, q));
    const clipped = clipPolylineToPins(regional.map((q) => q[0]), regional.map((q) => q[1]), pL, pR).clipped;
    // A regional with x increasing throughout is the graph of a function and cannot cross itself.
    if (!clipped || !increasing(clipped.xs)) return null;
    const h = horizons[i];
    const r = meanElevation(clipped.xs, clipped.zs);
    const excessArea = h.excessArea - p.pinWidth * (r - h.regionalElevation);
    const projected = sectionHorizons[i].projected?.length ? projectedContribution(h.line, clipped) : { area: 0, length: 0 };
    const rest = Math.abs(excessArea - projected.area);
    horizons[i] = {
      ...h, regional: clipped, excessArea, regionalElevation: r, regionalLength: polylineLength(clipped.xs, clipped.zs),
      regionalBeyond: lengthBeyondSpan(clipped.xs, clipped.zs),
      projectedArea: projected.area, projectedLength: projected.length,
      projectedAreaShare: projected.area === 0 ? 0 : Math.abs(projected.area) / (Math.abs(projected.area) + rest),
    };
    sectionHorizons[i] = { ...sectionHorizons[i], regional };
    areas[i] = excessArea;
    elevations[i] = r;
  }
  const section = docSection.section;
  let highest = -Infinity;
  for (let i = 0; i < elevations.length; i++) if (elevations[i] > highest) highest = elevations[i];
  const referenceElevation = section.referenceElevation ?? highest;
  const analysis = analysePrepared({ ...p, referenceElevation, horizons, areas, regionalElevations: elevations });
  return { docSection: { ...docSection, section: { ...section, horizons: sectionHorizons } }, outcome: { ok: true, analysis, warnings: [] }, leftOut: base.leftOut };
}

function sameExceptRegionals(doc: ProjectDoc, start: ProjectDoc, base: DocGestureBase): boolean {
  const s = activeScenario(doc);
  const b = base.scenario;
  if (doc.horizons !== start.horizons || doc.faults !== start.faults || doc.calibration !== start.calibration || doc.units !== start.units || s.id !== b.id) return false;
  if (doc.resolution !== start.resolution || (doc.scan === null) !== (start.scan === null)) return false;
  if (s.pinsPx !== b.pinsPx || s.excluded !== b.excluded || s.referenceElevation !== b.referenceElevation) return false;
  // The same horizons must have a regional (docToSection skips the others).
  return doc.horizons.every((h) => (s.regionals[h.id]?.length >= 2) === (b.regionals[h.id]?.length >= 2));
}

function increasing(xs: ArrayLike<number>): boolean {
  for (let k = 1; k < xs.length; k++) if (!(xs[k] > xs[k - 1])) return false;
  return true;
}

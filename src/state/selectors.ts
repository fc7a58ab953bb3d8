// Derived results, computed from the document on demand and memoised; never stored.
import { analyseDocSection, type DocAnalysis } from '../core/analysis/analyseDocSection';
import { analysePrepared } from '../core/analysis/analyseSection';
import { prepareSection, type PreparedSection } from '../core/analysis/prepareSection';
import { projectedContribution } from '../core/analysis/projectedContribution';
import { imageToSection } from '../core/calibration/mapPoints';
import { clipPolylineToPins } from '../core/geometry/clipPolylineToPins';
import { meanElevation } from '../core/geometry/meanElevation';
import { polylineLength } from '../core/geometry/polylineLength';
import { activeScenario, docToSection, type DocSection } from '../core/model/docToSection';
import type { ProjectDoc, Scenario } from '../core/model/projectDoc';
import { maxOf } from '../core/stats/minMax';

// docToSection reads the scenario, the horizons, the calibration and the units and nothing else, so
// the result is memoised on those four objects: editing one scenario (or undoing to a document that
// shares them) does not re-analyse the others.
interface Entry { horizons: ProjectDoc['horizons']; calibration: ProjectDoc['calibration']; units: ProjectDoc['units']; result: DocAnalysis }
const cache = new WeakMap<Scenario, Entry>();

/** Returns the analysis of the document's active (or given) scenario, memoised on what it depends on. */
export function selectAnalysis(doc: ProjectDoc, scenarioId?: string): DocAnalysis {
  const scenario = activeScenario(doc, scenarioId);
  const hit = scenario ? cache.get(scenario) : undefined;
  if (hit && hit.horizons === doc.horizons && hit.calibration === doc.calibration && hit.units === doc.units) return hit.result;
  const result = analyseDocSection(docToSection(doc, scenarioId));
  if (scenario) cache.set(scenario, { horizons: doc.horizons, calibration: doc.calibration, units: doc.units, result });
  return result;
}

// While a regional is dragged only the active scenario's regionals change. The section at the start of
// the gesture is prepared once (validated, clipped, measured); each step then re-measures only the
// moved regionals: the loop area changes by exactly −W0·Δr (the shoelace loop splits into the horizon
// part and −∫ regional dx over the pins = −W0·r; docs/method.md §Pins, regional and excess area), the
// regional length and elevation are those of the new clipped regional, and analysePrepared gives the
// same analysis as analyseSection would. Anything else changed (pins, horizons, calibration, included
// horizons, a regional that no longer crosses each pin once) takes the full analysis.

interface GestureBase { scenario: Scenario; docSection: Extract<DocSection, { ok: true }>; prepared: PreparedSection }
const bases = new WeakMap<ProjectDoc, GestureBase | null>();
const live = new WeakMap<ProjectDoc, DocAnalysis>();

function gestureBase(start: ProjectDoc): GestureBase | null {
  if (bases.has(start)) return bases.get(start) ?? null;
  const docSection = docToSection(start);
  const prep = docSection.ok && docSection.section.horizons.length > 0 ? prepareSection(docSection.section) : null;
  const base = docSection.ok && prep?.ok ? { scenario: activeScenario(start), docSection, prepared: prep.prepared } : null;
  bases.set(start, base);
  return base;
}

function sameExceptRegionals(doc: ProjectDoc, start: ProjectDoc, base: GestureBase): boolean {
  const s = activeScenario(doc);
  const b = base.scenario;
  if (doc.horizons !== start.horizons || doc.calibration !== start.calibration || doc.units !== start.units || s.id !== b.id) return false;
  if (s.pinsPx !== b.pinsPx || s.excluded !== b.excluded || s.referenceElevation !== b.referenceElevation) return false;
  // The same horizons must have a regional (docToSection skips the others).
  return doc.horizons.every((h) => (s.regionals[h.id]?.length >= 2) === (b.regionals[h.id]?.length >= 2));
}

function increasing(xs: ArrayLike<number>): boolean {
  for (let k = 1; k < xs.length; k++) if (!(xs[k] > xs[k - 1])) return false;
  return true;
}

function shifted(doc: ProjectDoc, base: GestureBase): DocAnalysis | null {
  const { docSection, prepared: p } = base;
  const scenario = activeScenario(doc);
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
    // A regional that misses or folds back over a pin, or could cross itself: the full analysis says why.
    if (!clipped || !increasing(clipped.xs)) return null;
    const h = horizons[i];
    const r = meanElevation(clipped.xs, clipped.zs);
    const excessArea = h.excessArea - p.pinWidth * (r - h.regionalElevation);
    const projected = sectionHorizons[i].projected?.length ? projectedContribution(h.line, clipped) : { area: 0, length: 0 };
    const rest = Math.abs(excessArea - projected.area);
    horizons[i] = {
      ...h, regional: clipped, excessArea, regionalElevation: r, regionalLength: polylineLength(clipped.xs, clipped.zs),
      projectedArea: projected.area, projectedLength: projected.length,
      projectedAreaShare: projected.area === 0 ? 0 : Math.abs(projected.area) / (Math.abs(projected.area) + rest),
    };
    sectionHorizons[i] = { ...sectionHorizons[i], regional };
    areas[i] = excessArea;
    elevations[i] = r;
  }
  const section = docSection.section;
  const referenceElevation = section.referenceElevation ?? maxOf(elevations);
  const analysis = analysePrepared({ ...p, referenceElevation, horizons, areas, regionalElevations: elevations });
  return { docSection: { ...docSection, section: { ...section, horizons: sectionHorizons } }, outcome: { ok: true, analysis, warnings: [] }, leftOut: [] };
}

/**
 * Returns the analysis of the active (or given) scenario as selectAnalysis does; while a gesture that
 * started from `gestureStart` moves only regionals, from the prepared start instead (same numbers, to
 * rounding). Pass null outside gestures.
 */
export function selectLiveAnalysis(doc: ProjectDoc, gestureStart: ProjectDoc | null, scenarioId?: string): DocAnalysis {
  if (!gestureStart || gestureStart === doc || (scenarioId !== undefined && scenarioId !== doc.activeScenarioId)) return selectAnalysis(doc, scenarioId);
  const hit = live.get(doc);
  if (hit) return hit;
  const base = gestureBase(gestureStart);
  const result = (base && sameExceptRegionals(doc, gestureStart, base) && shifted(doc, base)) || selectAnalysis(doc, scenarioId);
  live.set(doc, result);
  return result;
}

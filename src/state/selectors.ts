// Derived results, computed from the document on demand and memoised; never stored.
import { analysePrepared, analyseSection, type AnalysisOutcome } from '../core/analysis/analyseSection';
import { prepareSection, type PreparedSection } from '../core/analysis/prepareSection';
import { projectedContribution } from '../core/analysis/projectedContribution';
import { imageToSection } from '../core/calibration/mapPoints';
import { clipPolylineToPins } from '../core/geometry/clipPolylineToPins';
import { meanElevation } from '../core/geometry/meanElevation';
import { polylineLength } from '../core/geometry/polylineLength';
import { activeScenario, docToSection, type DocSection } from '../core/model/docToSection';
import type { ProjectDoc, Scenario } from '../core/model/projectDoc';

/** A horizon the engine could not analyse (its own input problem), left out so that the others still are. */
export interface LeftOutHorizon { id: string; name: string; reason: string }

export interface DocAnalysis {
  /** The section analysed: without the left-out horizons (their ids are not in horizonIds). */
  docSection: DocSection;
  /** Null when the document is not yet ready to analyse (no calibration, no pins, no regionals). */
  outcome: AnalysisOutcome | null;
  /** Horizons left out for a problem of their own (e.g. a regional short of a pin); empty when none. */
  leftOut: LeftOutHorizon[];
}

// One unfinished horizon must not hide the results of the others while the user works (the CLI stays
// strict: it reads analyseSection directly). When every problem the engine reports names a horizon,
// those horizons are left out with the engine's message as the reason and the rest is analysed again;
// a problem of the whole section (pins, units) still stops the analysis.
function analyseLenient(docSection: DocSection): DocAnalysis {
  if (!docSection.ok || docSection.section.horizons.length === 0) return { docSection, outcome: null, leftOut: [] };
  const outcome = analyseSection(docSection.section);
  if (outcome.ok || !outcome.problems.every((p) => p.horizon !== undefined)) return { docSection, outcome, leftOut: [] };
  const bad = new Map<string, string>();
  for (const p of outcome.problems) {
    const reason = problemReason(p.message, p.horizon!);
    const had = bad.get(p.horizon!);
    bad.set(p.horizon!, had && had !== reason ? `${had}; ${reason}` : reason);
  }
  const keep = docSection.section.horizons.map((h) => !bad.has(h.name));
  // A problem naming no horizon of the section, or every horizon bad: nothing to gain, report as it is.
  if (keep.every((k) => k) || !keep.some((k) => k)) return { docSection, outcome, leftOut: [] };
  const leftOut = docSection.horizonIds.flatMap((id, i) => (keep[i] ? [] : [{ id, name: docSection.section.horizons[i].name, reason: bad.get(docSection.section.horizons[i].name)! }]));
  const reduced: DocSection = {
    ...docSection,
    section: { ...docSection.section, horizons: docSection.section.horizons.filter((_, i) => keep[i]) },
    horizonIds: docSection.horizonIds.filter((_, i) => keep[i]),
  };
  const again = analyseSection(reduced.section);
  // Leaving some out can bring up a problem of the rest only in theory (problems are per horizon); keep it honest.
  return again.ok ? { docSection: reduced, outcome: again, leftOut } : { docSection, outcome, leftOut: [] };
}

/** The engine's message without its leading 'Horizon "name": ' (the pane names the horizon itself). */
function problemReason(message: string, name: string): string {
  const prefix = `Horizon "${name}"`;
  if (!message.startsWith(prefix)) return message;
  return message.slice(prefix.length).replace(/^\s*[:,]?\s*/, '');
}

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
  const result = analyseLenient(docToSection(doc, scenarioId));
  if (scenario) cache.set(scenario, { horizons: doc.horizons, calibration: doc.calibration, units: doc.units, result });
  return result;
}

// While a regional is dragged only the active scenario's regionals change. The section at the start of
// the gesture is prepared once (validated, clipped, measured); each step then re-measures only the
// moved regionals: the loop area changes by exactly −W0·Δr (the shoelace loop splits into the horizon
// part and −∫ regional dx over the pins = −W0·r; METHOD.md, excess area and regional elevation), the
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
  const referenceElevation = section.referenceElevation ?? Math.max(...elevations);
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

/**
 * Whether the area–depth line passes through its points exactly (residual standard error 0, or r² = 1
 * to 12 digits) with points to spare (n ≥ 3): its intervals then have zero width, which reads like
 * certainty; the pane says "exact fit (no scatter)" instead of a zero-width interval.
 */
export function isExactFit(ad: { n: number; s: number; r2: number } | null | undefined): boolean {
  return !!ad && ad.n >= 3 && (ad.s === 0 || Math.abs(1 - ad.r2) < 1e-12);
}

/** What the pane writes in place of the interval of an exact fit. */
export const EXACT_FIT_TEXT = 'exact fit (no scatter): no interval';

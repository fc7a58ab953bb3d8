// Derived results, computed from the document on demand and memoised; never stored. The analysis itself
// is core's (analyseDocGesture.ts): these selectors only remember it, so every view and export that reads
// them shows one computation.
import type { DocAnalysis } from '../core/analysis/analyseDocSection';
import { analyseDoc, analyseDocGesture, prepareDocGesture, type DocGestureBase } from '../core/analysis/analyseDocGesture';
import { activeScenario } from '../core/model/docToSection';
import { crossingVerdictsVersion } from '../core/geometry/crossingVerdicts';
import { createPreparationBuffer } from '../core/analysis/preparationBuffer';
import type { ProjectDoc, Scenario } from '../core/model/projectDoc';
import type { ClippedPolyline } from '../core/geometry/clipPolylineToPins';
import type { FittedCalibration } from '../core/calibration/fitCalibration';

// docToSection reads the scenario, the horizons, the faults, the calibration, the units, the stated
// resolution and whether there is a scan (digitisingResolution), and nothing else, so the result is memoised
// on those: editing one scenario (or undoing to a document that shares them) does not re-analyse the others.
// A self-crossing verdict that arrives from the worker (crossingChecks.ts) changes the result too: it is remembered
// with the verdicts' version.
interface Entry {
  horizons: ProjectDoc['horizons']; faults: ProjectDoc['faults']; calibration: ProjectDoc['calibration']; units: ProjectDoc['units'];
  resolution: ProjectDoc['resolution']; scanned: boolean; verdicts: number; result: DocAnalysis;
}
const cache = new WeakMap<Scenario, Entry>();
// The page analyses again on every edit; its one reusable buffer for the engine's passing points (the
// analyses here run one at a time and keep only numbers and fresh arrays).
const analysisBuffer = createPreparationBuffer();

/** Returns the analysis of the document's active (or given) scenario, memoised on what it depends on. */
export function selectAnalysis(doc: ProjectDoc, scenarioId?: string): DocAnalysis {
  const scenario = activeScenario(doc, scenarioId);
  const hit = scenario ? cache.get(scenario) : undefined;
  const verdicts = crossingVerdictsVersion();
  if (hit && hit.horizons === doc.horizons && hit.faults === doc.faults && hit.calibration === doc.calibration && hit.units === doc.units
    && hit.resolution === doc.resolution && hit.scanned === (doc.scan !== null) && hit.verdicts === verdicts) return hit.result;
  const result = analyseDoc(doc, scenarioId, analysisBuffer);
  if (scenario) cache.set(scenario, { horizons: doc.horizons, faults: doc.faults, calibration: doc.calibration, units: doc.units, resolution: doc.resolution, scanned: doc.scan !== null, verdicts, result });
  return result;
}

/**
 * Returns the horizon's line clipped to the pins as the analysis of this document already holds it (its
 * preparation), or null when there is none yet or it was clipped to other pins: it reads, it never analyses.
 */
export function keptClippedLine(doc: ProjectDoc, horizonId: string, pins: readonly [number, number], frame: FittedCalibration): ClippedPolyline | null {
  const scenario = activeScenario(doc);
  const hit = scenario ? cache.get(scenario) : undefined;
  if (!hit || hit.horizons !== doc.horizons || hit.faults !== doc.faults || hit.calibration !== doc.calibration) return null;
  const { prepared, docSection } = hit.result;
  if (!prepared || !docSection.ok || prepared.pins[0] !== pins[0] || prepared.pins[1] !== pins[1]) return null;
  const same = (p: readonly number[], q: readonly number[]) => p.length === q.length && p.every((x, k) => Object.is(x, q[k]));
  if (!same(docSection.fit.a, frame.a) || !same(docSection.fit.b, frame.b)) return null;
  const i = docSection.horizonIds.indexOf(horizonId);
  return i >= 0 ? prepared.horizons[i]?.line ?? null : null;
}

// While a gesture moves only regionals, the gesture's start is prepared once and each step re-measures
// only the moved regionals (analyseDocGesture); whatever that fast step cannot vouch for takes the full
// analysis, so the result is always selectAnalysis's, to rounding.
const bases = new WeakMap<ProjectDoc, { base: DocGestureBase | null; verdicts: number }>();
const live = new WeakMap<ProjectDoc, DocAnalysis>();

function gestureBase(start: ProjectDoc): DocGestureBase | null {
  const verdicts = crossingVerdictsVersion();
  const hit = bases.get(start);
  if (hit && hit.verdicts === verdicts) return hit.base;
  const base = prepareDocGesture(start, selectAnalysis(start), analysisBuffer);
  bases.set(start, { base, verdicts });
  return base;
}

/**
 * Prepares the document as the start of a future gesture (analysis and preparation, memoised), so that the
 * first move of the next drag finds it ready instead of preparing a big document then.
 */
export function prepareForGesture(doc: ProjectDoc): void {
  gestureBase(doc);
}

/** True once the document has been prepared as a gesture's start (prepareForGesture, or a gesture from it). */
export function preparedForGesture(doc: ProjectDoc): boolean {
  return bases.get(doc)?.verdicts === crossingVerdictsVersion();
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
  const result = (base && analyseDocGesture(doc, gestureStart, base)) || selectAnalysis(doc, scenarioId);
  live.set(doc, result);
  return result;
}

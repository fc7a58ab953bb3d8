// The numbers of the results strip, fast enough to follow a regional drag every frame.
// The section is prepared (validated, clipped, measured) once per change of anything but the
// regionals; a regional drag then only re-measures each regional's mean elevation r over the pins.
// Moving a regional changes the horizon's loop area by exactly −W0·Δr, since the shoelace loop
// splits into the horizon part and the regional part (−∫ regional dz over the pins = −W0·r;
// docs/method.md §Pins, regional and excess area), so evaluateShifted with per-horizon offsets Δr
// gives the same excess areas and area–depth line as a full analysis.
import { imageToSection } from '../../core/calibration/mapPoints';
import { prepareSection, type PreparedSection } from '../../core/analysis/prepareSection';
import { createEvaluationScratch, evaluateShifted, type EvaluationScratch } from '../../core/analysis/evaluateShifted';
import { clipPolylineToPins } from '../../core/geometry/clipPolylineToPins';
import { meanElevation } from '../../core/geometry/meanElevation';
import { documentFit } from '../../core/model/commands/sectionFrame';
import { activeScenario, docToSection } from '../../core/model/docToSection';
import type { ProjectDoc } from '../../core/model/projectDoc';
import type { LengthUnit } from '../../core/model/section';

export interface LiveHorizon { id: string; name: string; colour: string; excessArea: number | null; included: boolean }

export type LiveResults =
  | { ready: false; message: string; horizons: LiveHorizon[] }
  | {
    ready: true; units: LengthUnit; horizons: LiveHorizon[];
    /** Null when fewer than two included horizons at distinct depths. */
    detachmentDepth: number | null; detachmentElevation: number | null; displacement: number | null;
    noDetachment: boolean; referenceElevation: number; note: string | null;
  };

interface Base {
  keys: unknown[];
  prepared: PreparedSection | null;
  problem: string | null;
  horizonIds: string[];
  pins: [number, number] | null;
  scratch: EvaluationScratch | null;
}

let base: Base | null = null;

function baseKeys(doc: ProjectDoc): unknown[] {
  const s = activeScenario(doc);
  const withRegional = doc.horizons.filter((h) => s.regionals[h.id]?.length >= 2).map((h) => h.id).join('\u0000');
  return [doc.horizons, doc.calibration, doc.units, s.id, s.pinsPx, s.excluded, s.referenceElevation, withRegional];
}

function baseFor(doc: ProjectDoc): Base | { message: string } {
  const keys = baseKeys(doc);
  if (base && base.keys.length === keys.length && base.keys.every((k, i) => k === keys[i])) return base;
  const ds = docToSection(doc);
  if (!ds.ok) return { message: ds.message };
  if (ds.section.horizons.length === 0) return { message: 'Draw a regional for each horizon to see its excess area.' };
  const prep = prepareSection(ds.section);
  base = {
    keys,
    prepared: prep.ok ? prep.prepared : null,
    problem: prep.ok ? null : prep.problems[0]?.message ?? 'The section cannot be analysed.',
    horizonIds: ds.horizonIds,
    pins: ds.section.pins,
    scratch: prep.ok ? createEvaluationScratch(prep.prepared) : null,
  };
  return base;
}

/** Returns the strip's numbers for the document (section units; areas in units²), or why there are none yet. */
export function liveResults(doc: ProjectDoc): LiveResults {
  const listed = (areas?: Map<string, number>): LiveHorizon[] => doc.horizons.map((h) => ({
    id: h.id, name: h.name, colour: h.colour, excessArea: areas?.get(h.id) ?? null, included: !activeScenario(doc).excluded.includes(h.id),
  }));
  const b = baseFor(doc);
  if ('message' in b) return { ready: false, message: b.message, horizons: listed() };
  if (!b.prepared || !b.pins || !b.scratch || b.problem) return { ready: false, message: b.problem ?? 'The section cannot be analysed.', horizons: listed() };
  const p = b.prepared;
  const scenario = activeScenario(doc);
  const fitDoc = documentFit(doc);
  if (!fitDoc) return { ready: false, message: 'Calibrate the scan first.', horizons: listed() };
  const offsets = new Float64Array(p.horizons.length);
  let highest = -Infinity;
  for (let i = 0; i < p.horizons.length; i++) {
    const reg = scenario.regionals[b.horizonIds[i]].map((q) => imageToSection(fitDoc, q));
    const clip = clipPolylineToPins(reg.map((q) => q[0]), reg.map((q) => q[1]), b.pins[0], b.pins[1]).clipped;
    if (!clip) return { ready: false, message: `Horizon "${p.horizons[i].name}": the regional must cross each pin exactly once.`, horizons: listed() };
    const r = meanElevation(clip.xs, clip.zs);
    offsets[i] = r - p.regionalElevations[i];
    highest = Math.max(highest, r);
  }
  const quick = evaluateShifted(p, { regionalOffsets: offsets }, b.scratch);
  const areas = new Map<string, number>();
  b.horizonIds.forEach((id, i) => areas.set(id, p.areas[i] - p.pinWidth * offsets[i]));
  // The reference follows the regionals when it is the default (the highest regional elevation).
  const zref = scenario.referenceElevation ?? highest;
  const elevation = quick?.detachmentElevation ?? null;
  return {
    ready: true, units: p.units, horizons: listed(areas),
    detachmentElevation: elevation,
    detachmentDepth: elevation === null ? null : zref - elevation,
    displacement: quick ? quick.displacement : null,
    noDetachment: quick?.noDetachment ?? false,
    referenceElevation: zref,
    note: !quick ? 'Include at least two horizons at different depths for an area–depth line.' : quick.noDetachment ? 'No detachment below these horizons: excess area does not decrease with depth.' : null,
  };
}

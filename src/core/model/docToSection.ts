// The bridge from the project document (image pixels) to the engine's plain section (section units).
import { fitCalibration, type FittedCalibration } from '../calibration/fitCalibration';
import { imageToSection } from '../calibration/mapPoints';
import { lineToSection } from '../calibration/lineToSection';
import { nearestOnPolyline } from '../geometry/nearestOnPolyline';
import { selfIntersections } from '../geometry/selfIntersections';
import type { DocFault, DocHorizon, ProjectDoc, Scenario } from './projectDoc';
import type { FlatLine, FlatSection, SectionFault, SectionHorizon, XZ } from './section';
import { digitisingResolution } from './digitisingResolution';
import { ON_FAULT_TOLERANCE } from './validateSectionArrays';
import { formatSmallNumber } from './numberText';

export interface SkippedHorizon { id: string; name: string; reason: string }
/** A fault left out of the section (too few vertices, or a line that crosses itself), with the reason. */
export interface SkippedFault { id: string; name: string; reason: string }

export type DocSection =
  | { ok: true; section: FlatSection; fit: FittedCalibration; horizonIds: string[]; skipped: SkippedHorizon[]; skippedFaults: SkippedFault[] }
  | { ok: false; message: string; fit: FittedCalibration | null };

/** Returns the active (or given) scenario of the document. */
export function activeScenario(doc: ProjectDoc, scenarioId?: string): Scenario {
  const id = scenarioId ?? doc.activeScenarioId;
  return doc.scenarios.find((s) => s.id === id) ?? doc.scenarios[0];
}

/** Returns the scenario's section in section units (lines as coordinate arrays), skipping (with a reason) horizons and faults not ready to analyse. */
export function docToSection(doc: ProjectDoc, scenarioId?: string): DocSection {
  if (!doc.calibration) return { ok: false, message: 'Calibrate the scan first: give known x and z positions.', fit: null };
  const cal = fitCalibration(doc.calibration);
  if (!cal.ok) return { ok: false, message: cal.message, fit: null };
  const fit = cal.fit;
  const scenario = activeScenario(doc, scenarioId);
  if (!scenario?.pinsPx) return { ok: false, message: 'Place the two pins.', fit };
  const pl = imageToSection(fit, scenario.pinsPx[0])[0];
  const pr = imageToSection(fit, scenario.pinsPx[1])[0];
  const toXZ = (p: [number, number]): XZ => imageToSection(fit, p);
  const { faults, usable, skippedFaults } = readFaults(doc.faults, fit);
  const tolerance = ON_FAULT_TOLERANCE * Math.abs(pr - pl);
  const horizons: SectionHorizon<FlatLine>[] = [];
  const horizonIds: string[] = [];
  const skipped: SkippedHorizon[] = [];
  for (const h of doc.horizons) {
    const regional = scenario.regionals[h.id];
    if (h.pointsPx.length < 2) {
      skipped.push({ id: h.id, name: h.name, reason: 'fewer than two vertices' });
      continue;
    }
    if (!regional || regional.length < 2) {
      skipped.push({ id: h.id, name: h.name, reason: 'no regional yet' });
      continue;
    }
    const shape = horizonShape(h, doc.faults, usable, fit, tolerance, doc.units);
    if (typeof shape === 'string') {
      skipped.push({ id: h.id, name: h.name, reason: shape });
      continue;
    }
    horizons.push({
      name: h.name,
      ...shape,
      regional: regional.map(toXZ),
      include: !scenario.excluded.includes(h.id),
      ...(h.projected.length ? { projected: h.projected.map(([a, b]) => [a, b] as [number, number]) } : {}),
    });
    horizonIds.push(h.id);
  }
  const section: FlatSection = {
    units: doc.units,
    pins: [Math.min(pl, pr), Math.max(pl, pr)],
    horizons,
    // The one rule (digitisingResolution): the stated resolution and one scan pixel, else a share of W₀.
    resolution: digitisingResolution({
      stated: doc.resolution,
      scanPixel: doc.scan ? Math.max(Math.abs(fit.unitsPerPxX), Math.abs(fit.unitsPerPxZ)) : undefined,
      pinWidth: pr - pl,
    }),
    ...(scenario.referenceElevation !== undefined ? { referenceElevation: scenario.referenceElevation } : {}),
    ...(faults.length ? { faults } : {}),
  };
  return { ok: true, section, fit, horizonIds, skipped, skippedFaults };
}

/** The document's faults in section units, those usable for joins (by id), and the ones left out with the reason. */
function readFaults(docFaults: readonly DocFault[], fit: FittedCalibration) {
  const faults: SectionFault<FlatLine>[] = [];
  const usable = new Map<string, SectionFault<FlatLine>>();
  const skippedFaults: SkippedFault[] = [];
  for (const f of docFaults) {
    if (f.pointsPx.length < 2) {
      skippedFaults.push({ id: f.id, name: f.name, reason: 'fewer than two vertices' });
      continue;
    }
    const line = lineToSection(fit, f.pointsPx);
    const crossing = selfIntersections(line.xs, line.zs, 1);
    if (crossing.length > 0) {
      const [i, j] = crossing[0];
      skippedFaults.push({ id: f.id, name: f.name, reason: `the line crosses itself (segments ${i}–${i + 1} and ${j}–${j + 1}); redraw it so it does not` });
      continue;
    }
    const sf = { name: f.name, line };
    faults.push(sf);
    usable.set(f.id, sf);
  }
  return { faults, usable, skippedFaults };
}

/**
 * The horizon's line, or its pieces with the name of each join's fault; or why it cannot be joined: a join
 * on a fault that is missing or left out, a piece of fewer than two vertices, a piece end off its fault.
 */
function horizonShape(
  h: DocHorizon, docFaults: readonly DocFault[], usable: ReadonlyMap<string, SectionFault<FlatLine>>,
  fit: FittedCalibration, tolerance: number, units: string,
): Pick<SectionHorizon<FlatLine>, 'line' | 'pieces' | 'joinFaults'> | string {
  // The whole line converted once (and remembered), the pieces views into it (no copy).
  const line = lineToSection(fit, h.pointsPx);
  if (h.joins.length === 0) return { line };
  const pieces: FlatLine[] = [];
  const joinFaults: string[] = [];
  let from = 0;
  for (let k = 0; k <= h.joins.length; k++) {
    const to = k < h.joins.length ? h.joins[k].at : h.pointsPx.length;
    if (to - from < 2) return `piece ${k + 1} has fewer than two vertices`;
    pieces.push({ xs: line.xs.subarray(from, to), zs: line.zs.subarray(from, to) });
    from = to;
  }
  for (let k = 0; k < h.joins.length; k++) {
    const id = h.joins[k].faultId;
    const named = docFaults.find((f) => f.id === id);
    const fault = usable.get(id);
    if (!named) return `the join after piece ${k + 1} is on a fault the document no longer has; join it again or remove the join`;
    if (!fault) return `it is joined on fault "${named.name}", which is left out (see the fault's own message)`;
    joinFaults.push(fault.name);
    const last = pieces[k].xs.length - 1;
    const ends: [string, XZ][] = [[`the end of piece ${k + 1}`, [pieces[k].xs[last], pieces[k].zs[last]]], [`the start of piece ${k + 2}`, [pieces[k + 1].xs[0], pieces[k + 1].zs[0]]]];
    for (const [what, p] of ends) {
      const near = nearestOnPolyline(fault.line.xs, fault.line.zs, p[0], p[1]);
      if (near && near.distance > tolerance) {
        return `${what} is ${fmt(near.distance)} ${units} off fault "${fault.name}", which it is joined along; move it onto the fault`;
      }
    }
  }
  return { pieces, joinFaults };
}

function fmt(v: number): string {
  return formatSmallNumber(v, 3);
}

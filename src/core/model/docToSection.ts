// The bridge from the project document (image pixels) to the engine's plain section (section units).
import { fitCalibration, type FittedCalibration } from '../calibration/fitCalibration';
import { imageToSection } from '../calibration/mapPoints';
import type { ProjectDoc, Scenario } from './projectDoc';
import type { Section, SectionHorizon } from './section';

export interface SkippedHorizon { id: string; name: string; reason: string }

export type DocSection =
  | { ok: true; section: Section; fit: FittedCalibration; horizonIds: string[]; skipped: SkippedHorizon[] }
  | { ok: false; message: string; fit: FittedCalibration | null };

/** Returns the active (or given) scenario of the document. */
export function activeScenario(doc: ProjectDoc, scenarioId?: string): Scenario {
  const id = scenarioId ?? doc.activeScenarioId;
  return doc.scenarios.find((s) => s.id === id) ?? doc.scenarios[0];
}

/** Returns the scenario's section in section units, skipping (with a reason) horizons not ready to analyse. */
export function docToSection(doc: ProjectDoc, scenarioId?: string): DocSection {
  if (!doc.calibration) return { ok: false, message: 'Calibrate the scan first: give known x and z positions.', fit: null };
  const cal = fitCalibration(doc.calibration);
  if (!cal.ok) return { ok: false, message: cal.message, fit: null };
  const fit = cal.fit;
  const scenario = activeScenario(doc, scenarioId);
  if (!scenario?.pinsPx) return { ok: false, message: 'Place the two pins.', fit };
  const pl = imageToSection(fit, scenario.pinsPx[0])[0];
  const pr = imageToSection(fit, scenario.pinsPx[1])[0];
  const horizons: SectionHorizon[] = [];
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
    horizons.push({
      name: h.name,
      line: h.pointsPx.map((p) => imageToSection(fit, p)),
      regional: regional.map((p) => imageToSection(fit, p)),
      include: !scenario.excluded.includes(h.id),
      ...(h.projected.length ? { projected: h.projected.map(([a, b]) => [a, b] as [number, number]) } : {}),
    });
    horizonIds.push(h.id);
  }
  const section: Section = {
    units: doc.units,
    pins: [Math.min(pl, pr), Math.max(pl, pr)],
    horizons,
    // One scan pixel: the digitising resolves no finer length change.
    resolution: Math.max(Math.abs(fit.unitsPerPxX), Math.abs(fit.unitsPerPxZ)),
    ...(scenario.referenceElevation !== undefined ? { referenceElevation: scenario.referenceElevation } : {}),
  };
  return { ok: true, section, fit, horizonIds, skipped };
}

// Turns the engine's plain section (section units) into a project document (image pixels) on a
// stand-in canvas, so a section file opens with its horizons, regionals and pins in place.
// A horizon in pieces becomes one list of vertices with a join where each piece after the first starts,
// on the fault the join names (or the first fault both piece ends lie on, as the engine joins them).
import { fitCalibration } from '../../calibration/fitCalibration';
import { sectionToImage } from '../../calibration/mapPoints';
import { nearestOnPolyline } from '../../geometry/nearestOnPolyline';
import { faultColour } from '../horizonPalette';
import { emptyProjectDoc, type DocFault, type DocHorizon, type HorizonJoin, type ImagePx, type ProjectDoc } from '../projectDoc';
import { horizonPieces, type Section, type SectionFault, type SectionHorizon, type XZ } from '../section';
import { ON_FAULT_TOLERANCE } from '../validateSectionArrays';
import { canvasCalibration } from './canvasCalibration';
import { paletteColour } from '../horizonPalette';
import { freshHorizonIds } from '../commands/addHorizon';

/** Returns a project document holding the section, calibrated onto a true-scale canvas; title is the given name. */
export function sectionToProjectDoc(section: Section, title = 'Section'): ProjectDoc {
  const sectionFaults = section.faults ?? [];
  const all: XZ[] = [...section.horizons.flatMap((h) => [...horizonPieces(h).flat(), ...h.regional]), ...sectionFaults.flatMap((f) => f.line)];
  // In a loop: spreading a long traced line's elevations into Math.min overflows the call stack.
  let zMin = Infinity;
  let zMax = -Infinity;
  for (const p of all) {
    if (p[1] < zMin) zMin = p[1];
    if (p[1] > zMax) zMax = p[1];
  }
  const zMid = all.length ? (zMin + zMax) / 2 : 0;
  all.push([section.pins[0], zMid], [section.pins[1], zMid]);
  const calibration = canvasCalibration(all);
  const fitted = fitCalibration(calibration);
  if (!fitted.ok) throw new Error(`canvasCalibration produced an unusable calibration: ${fitted.message}`);
  const toPx = (q: XZ): ImagePx => sectionToImage(fitted.fit, q);
  const doc = emptyProjectDoc();
  const ids = freshHorizonIds(doc, section.horizons.length);
  const faults: DocFault[] = sectionFaults.map((f, i) => ({
    id: `fault-${i + 1}`, name: f.name, colour: faultColour(i), visible: true, locked: false, pointsPx: f.line.map(toPx),
  }));
  const tolerance = ON_FAULT_TOLERANCE * Math.abs(section.pins[1] - section.pins[0]);
  const horizons: DocHorizon[] = section.horizons.map((h, i) => ({
    id: ids[i],
    name: h.name,
    colour: paletteColour(i),
    visible: true,
    locked: false,
    // Pieces in order, one flat list; projected runs already count along the pieces.
    pointsPx: horizonPieces(h).flat().map(toPx),
    projected: (h.projected ?? []).map(([a, b]) => [a, b] as [number, number]),
    joins: joinsOf(h, sectionFaults, faults, tolerance),
  }));
  const scenario = {
    ...doc.scenarios[0],
    pinsPx: [toPx([section.pins[0], zMid]), toPx([section.pins[1], zMid])] as [ImagePx, ImagePx],
    regionals: Object.fromEntries(section.horizons.map((h, i) => [horizons[i].id, h.regional.map(toPx)])),
    excluded: section.horizons.flatMap((h, i) => (h.include === false ? [horizons[i].id] : [])),
    ...(section.referenceElevation !== undefined ? { referenceElevation: section.referenceElevation } : {}),
  };
  // The canvas is no scan: a resolution the file states is kept, else the one rule falls back on W₀ (digitisingResolution).
  const stated = section.resolution !== undefined && Number.isFinite(section.resolution) && section.resolution > 0 ? { resolution: section.resolution } : {};
  return { ...doc, title, units: section.units, calibration, horizons, faults, scenarios: [scenario], ...stated };
}

/** The joins of a horizon in pieces: one where each piece after the first starts, on the named fault or the first one both ends lie on (a validated section has one). */
function joinsOf(h: SectionHorizon, sectionFaults: readonly SectionFault[], faults: readonly DocFault[], tolerance: number): HorizonJoin[] {
  const pieces = h.pieces ?? [];
  const joins: HorizonJoin[] = [];
  let at = 0;
  for (let k = 0; k + 1 < pieces.length; k++) {
    at += pieces[k].length;
    const a = pieces[k][pieces[k].length - 1], b = pieces[k + 1][0];
    const named = h.joinFaults?.[k];
    const i = sectionFaults.findIndex((f) => (named !== undefined ? f.name === named : onLine(f.line, a, tolerance) && onLine(f.line, b, tolerance)));
    if (i >= 0) joins.push({ at, faultId: faults[i].id });
  }
  return joins;
}

function onLine(line: readonly XZ[], p: XZ, tolerance: number): boolean {
  const near = nearestOnPolyline(line.map((q) => q[0]), line.map((q) => q[1]), p[0], p[1]);
  return near !== null && near.distance <= tolerance;
}

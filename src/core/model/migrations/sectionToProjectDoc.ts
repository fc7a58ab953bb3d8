// Turns the engine's plain section (section units) into a project document (image pixels) on a
// stand-in canvas, so a section file opens with its horizons, regionals and pins in place.
import { fitCalibration } from '../../calibration/fitCalibration';
import { sectionToImage } from '../../calibration/mapPoints';
import { emptyProjectDoc, type DocHorizon, type ImagePx, type ProjectDoc } from '../projectDoc';
import { horizonPieces, type Section, type XZ } from '../section';
import { canvasCalibration } from './canvasCalibration';
import { paletteColour } from '../horizonPalette';
import { freshHorizonIds } from '../commands/addHorizon';


/** Returns a project document holding the section, calibrated onto a true-scale canvas; title is the given name. */
export function sectionToProjectDoc(section: Section, title = 'Section'): ProjectDoc {
  const all: XZ[] = section.horizons.flatMap((h) => [...horizonPieces(h).flat(), ...h.regional]);
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
  const horizons: DocHorizon[] = section.horizons.map((h, i) => ({
    id: ids[i],
    name: h.name,
    colour: paletteColour(i),
    visible: true,
    locked: false,
    // A horizon in pieces is opened through its own path (the caller refuses it until then): only a line here.
    pointsPx: (h.line ?? []).map(toPx),
    projected: (h.projected ?? []).map(([a, b]) => [a, b] as [number, number]),
  }));
  const scenario = {
    ...doc.scenarios[0],
    pinsPx: [toPx([section.pins[0], zMid]), toPx([section.pins[1], zMid])] as [ImagePx, ImagePx],
    regionals: Object.fromEntries(section.horizons.map((h, i) => [horizons[i].id, h.regional.map(toPx)])),
    excluded: section.horizons.flatMap((h, i) => (h.include === false ? [horizons[i].id] : [])),
    ...(section.referenceElevation !== undefined ? { referenceElevation: section.referenceElevation } : {}),
  };
  return { ...doc, title, units: section.units, calibration, horizons, scenarios: [scenario] };
}

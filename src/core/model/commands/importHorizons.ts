// Adds horizons given in section units (from CSV, GeoJSON or SVG) to the document, which stores
// image pixels: each vertex goes through the inverse of the calibration. Without a usable
// calibration the document gets a true-scale stand-in canvas first (as for a section file).
import { nameWithSuffix } from '../limits';
import { fitCalibration } from '../../calibration/fitCalibration';
import { sectionToImage } from '../../calibration/mapPoints';
import { canvasCalibration } from '../migrations/canvasCalibration';
import { paletteColour } from '../horizonPalette';
import { freshHorizonIds } from './addHorizon';
import type { DocHorizon, ProjectDoc } from '../projectDoc';
import type { LengthUnit, XZ } from '../section';

export interface ImportedHorizon { name: string; line: XZ[] }

/** Exact by definition of the international foot (1959). */
const METRES_PER_FOOT = 0.3048;

function convert(v: number, from: LengthUnit, to: LengthUnit): number {
  if (from === to) return v;
  return from === 'ft' ? v * METRES_PER_FOOT : v / METRES_PER_FOOT;
}

function uniqueName(name: string, taken: Set<string>): string {
  let candidate = name;
  for (let k = 2; taken.has(candidate); k++) candidate = nameWithSuffix(name, ` (${k})`);
  taken.add(candidate);
  return candidate;
}

/** Returns the document with the horizons added (converted from `units` to the document's, renamed on clashes); lines with < 2 points are dropped; an empty list returns the same document. */
export function importHorizons(doc: ProjectDoc, horizons: ImportedHorizon[], units: LengthUnit): ProjectDoc {
  const usable = horizons.filter((h) => h.line.length >= 2);
  if (usable.length === 0) return doc;
  // A fresh document takes the file's units; otherwise coordinates are converted to the document's.
  const fresh = doc.horizons.length === 0 && doc.calibration === null;
  const docUnits: LengthUnit = fresh ? units : doc.units;
  const lines = usable.map((h) => h.line.map(([x, z]): XZ => [convert(x, units, docUnits), convert(z, units, docUnits)]));
  let calibration = doc.calibration;
  let fit = calibration ? fitCalibration(calibration) : null;
  if (!fit || !fit.ok) {
    calibration = canvasCalibration(lines.flat());
    fit = fitCalibration(calibration);
    if (!fit.ok) return doc;
  }
  const f = fit.fit;
  const names = new Set(doc.horizons.map((h) => h.name));
  const ids = freshHorizonIds(doc, usable.length);
  const added: DocHorizon[] = usable.map((h, i) => ({
    id: ids[i],
    name: uniqueName(h.name, names),
    colour: paletteColour(doc.horizons.length + i),
    visible: true,
    locked: false,
    pointsPx: lines[i].map((q) => sectionToImage(f, q)),
    projected: [],
    joins: [],
  }));
  return { ...doc, units: docUnits, calibration, horizons: [...doc.horizons, ...added] };
}

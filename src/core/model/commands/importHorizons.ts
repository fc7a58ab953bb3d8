// Adds horizons given in section units (from CSV, GeoJSON or SVG) to the document, which stores
// image pixels: each vertex goes through the inverse of the calibration. Without a usable
// calibration the document gets a true-scale stand-in canvas first (as for a section file).
import { nameWithSuffix } from '../limits';
import { fitCalibration } from '../../calibration/fitCalibration';
import { sectionToImage } from '../../calibration/mapPoints';
import { canvasCalibration } from '../migrations/canvasCalibration';
import { paletteColour } from '../horizonPalette';
import { freshHorizonIds } from './addHorizon';
import { nearestOnPolyline } from '../../geometry/nearestOnPolyline';
import { freeFaultName, nextFaultId } from './addFault';
import { faultColour } from '../horizonPalette';
import type { DocFault, DocHorizon, HorizonJoin, ImagePx, ProjectDoc } from '../projectDoc';
import type { LengthUnit, XZ } from '../section';

/** A horizon read from a file: `line` is every vertex in order; `pieces`, for a horizon cut by faults, the same vertices split into its pieces. */
export interface ImportedHorizon { name: string; line: XZ[]; pieces?: XZ[][] }
/** A fault read from a file (section units). */
export interface ImportedFault { name: string; line: XZ[] }

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

/**
 * Returns the document with the horizons and faults added (converted from `units` to the document's, renamed on
 * clashes); lines with < 2 points are dropped; a horizon in pieces is joined where each piece starts, on the
 * first fault (imported or already there) both piece ends lie on, as the engine joins them; an empty list
 * returns the same document.
 */
export function importHorizons(doc: ProjectDoc, horizons: ImportedHorizon[], units: LengthUnit, importedFaults: ImportedFault[] = []): ProjectDoc {
  const usable = horizons.filter((h) => h.line.length >= 2);
  const faultsIn = importedFaults.filter((f) => f.line.length >= 2);
  if (usable.length === 0 && faultsIn.length === 0) return doc;
  // A fresh document takes the file's units; otherwise coordinates are converted to the document's.
  const fresh = doc.horizons.length === 0 && doc.calibration === null;
  const docUnits: LengthUnit = fresh ? units : doc.units;
  const lines = usable.map((h) => h.line.map(([x, z]): XZ => [convert(x, units, docUnits), convert(z, units, docUnits)]));
  let calibration = doc.calibration;
  let fit = calibration ? fitCalibration(calibration) : null;
  if (!fit || !fit.ok) {
    calibration = canvasCalibration([...lines.flat(), ...faultsIn.flatMap((x) => x.line.map(([a, b]): XZ => [convert(a, units, docUnits), convert(b, units, docUnits)]))]);
    fit = fitCalibration(calibration);
    if (!fit.ok) return doc;
  }
  const f = fit.fit;
  const toPx = (q: XZ): ImagePx => sectionToImage(f, [convert(q[0], units, docUnits), convert(q[1], units, docUnits)]);
  let withFaults: ProjectDoc = doc;
  for (const x of faultsIn) {
    const id = nextFaultId(withFaults);
    const fault: DocFault = { id, name: freeFaultName(withFaults, id, x.name), colour: faultColour(withFaults.faults.length), visible: true, locked: false, pointsPx: x.line.map(toPx) };
    withFaults = { ...withFaults, faults: [...withFaults.faults, fault] };
  }
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
    joins: h.pieces && h.pieces.length > 1 ? joinsOf(h.pieces.map((p) => p.map(toPx)), withFaults.faults) : [],
  }));
  return { ...withFaults, units: docUnits, calibration, horizons: [...doc.horizons, ...added] };
}

/** How near (image pixels) a piece end must be to a fault to be joined on it: files written by the app are exact to 1e-6 unit. */
const JOIN_PX = 1e-2;

/** The joins of pieces (image pixels): where each piece after the first starts, on the first fault both ends lie on; a cut on no fault is left unjoined. */
function joinsOf(pieces: ImagePx[][], faults: readonly DocFault[]): HorizonJoin[] {
  const joins: HorizonJoin[] = [];
  let at = 0;
  for (let k = 0; k + 1 < pieces.length; k++) {
    at += pieces[k].length;
    const a = pieces[k][pieces[k].length - 1], b = pieces[k + 1][0];
    const on = faults.find((x) => near(x, a) && near(x, b));
    if (on) joins.push({ at, faultId: on.id });
  }
  return joins;
}

function near(f: DocFault, p: ImagePx): boolean {
  const n = nearestOnPolyline(f.pointsPx.map((q) => q[0]), f.pointsPx.map((q) => q[1]), p[0], p[1]);
  return n !== null && n.distance <= JOIN_PX;
}

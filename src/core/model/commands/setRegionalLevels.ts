// A regional typed as numbers: a straight line given by its elevations at the two pins, or through a point
// at a dip. It spans the pins and 5 % of the pin width beyond each, as a proposed regional does, so it
// crosses both pins; a polyline regional it replaces becomes straight.
import { sectionToImage } from '../../calibration/mapPoints';
import { activeScenario } from '../docToSection';
import type { ProjectDoc } from '../projectDoc';
import { pinXs } from './pinXs';
import { sectionFrame } from './sectionFrame';
import { setRegional } from './setRegional';

/** Returns the document with the horizon's regional straight through zLeft at the left pin and zRight at the right pin; unchanged without pins or for non-finite input. */
export function setRegionalLevels(doc: ProjectDoc, horizonId: string, zLeft: number, zRight: number, scenarioId?: string): ProjectDoc {
  const frame = sectionFrame(doc);
  const pins = pinXs(activeScenario(doc, scenarioId).pinsPx, frame);
  if (!pins || !Number.isFinite(zLeft) || !Number.isFinite(zRight) || !doc.horizons.some((h) => h.id === horizonId)) return doc;
  const w0 = pins[1] - pins[0];
  const slope = (zRight - zLeft) / w0;
  const ends: [number, number][] = [pins[0] - 0.05 * w0, pins[1] + 0.05 * w0].map((x) => [x, zLeft + slope * (x - pins[0])]);
  return setRegional(doc, horizonId, ends.map((q) => sectionToImage(frame, q)), scenarioId);
}

/** Returns the document with the horizon's regional straight through (x, z) at dipDeg (degrees, positive = down towards +x, |dip| < 90); unchanged otherwise. */
export function setRegionalThrough(doc: ProjectDoc, horizonId: string, x: number, z: number, dipDeg: number, scenarioId?: string): ProjectDoc {
  if (!(Math.abs(dipDeg) < 90) || !Number.isFinite(x) || !Number.isFinite(z)) return doc;
  const pins = pinXs(activeScenario(doc, scenarioId).pinsPx, sectionFrame(doc));
  if (!pins) return doc;
  const t = Math.tan((dipDeg * Math.PI) / 180);
  return setRegionalLevels(doc, horizonId, z - t * (pins[0] - x), z - t * (pins[1] - x), scenarioId);
}

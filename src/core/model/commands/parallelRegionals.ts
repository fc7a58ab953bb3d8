import { imageToSection, sectionToImage } from '../../calibration/mapPoints';
import { activeScenario } from '../docToSection';
import type { ImagePx, ProjectDoc } from '../projectDoc';
import { horizonLevelAtPins } from './horizonLevelAtPins';
import { pinXs } from './pinXs';
import { sectionFrame } from './sectionFrame';
import { updateScenario } from './updateScenario';

/**
 * Returns the document with every other horizon's regional replaced by a parallel copy of the source
 * horizon's regional, moved up or down by the difference of the two horizons' elevations at the pins
 * (each horizon's own level); horizons reaching neither pin keep theirs. Unchanged without pins or source regional.
 */
export function parallelRegionals(doc: ProjectDoc, sourceHorizonId: string, scenarioId?: string): ProjectDoc {
  const scenario = activeScenario(doc, scenarioId);
  const frame = sectionFrame(doc);
  const pins = pinXs(scenario.pinsPx, frame);
  const source = doc.horizons.find((h) => h.id === sourceHorizonId);
  const sourceRegional = scenario.regionals[sourceHorizonId];
  if (!pins || !source || !sourceRegional) return doc;
  const sourceLevel = horizonLevelAtPins(source, frame, pins);
  if (!Number.isFinite(sourceLevel)) return doc;
  const sourceXZ = sourceRegional.map((p) => imageToSection(frame, p));
  return updateScenario(doc, (s) => {
    const regionals: Record<string, ImagePx[]> = { ...s.regionals };
    for (const h of doc.horizons) {
      if (h.id === sourceHorizonId) continue;
      const level = horizonLevelAtPins(h, frame, pins);
      if (!Number.isFinite(level)) continue;
      const dz = level - sourceLevel;
      regionals[h.id] = sourceXZ.map(([x, z]) => sectionToImage(frame, [x, z + dz]));
    }
    return { ...s, regionals };
  }, scenario.id);
}

import { imageToSection, sectionToImage } from '../../calibration/mapPoints';
import type { ImagePx, ProjectDoc } from '../projectDoc';
import { sectionFrame } from './sectionFrame';
import { updateScenario } from './updateScenario';

/** Returns the document with the given horizons' regionals (all when null) moved up by dz in section units (image pixels before calibration). */
export function offsetRegionals(doc: ProjectDoc, horizonIds: string[] | null, dz: number, scenarioId?: string): ProjectDoc {
  if (dz === 0) return doc;
  const frame = sectionFrame(doc);
  return updateScenario(doc, (s) => {
    const regionals: Record<string, ImagePx[]> = { ...s.regionals };
    let changed = false;
    for (const id of Object.keys(regionals)) {
      if (horizonIds && !horizonIds.includes(id)) continue;
      regionals[id] = regionals[id].map((p) => {
        const [x, z] = imageToSection(frame, p);
        return sectionToImage(frame, [x, z + dz]);
      });
      changed = true;
    }
    return changed ? { ...s, regionals } : s;
  }, scenarioId);
}

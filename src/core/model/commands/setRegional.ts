import type { ImagePx, ProjectDoc } from '../projectDoc';
import { updateScenario } from './updateScenario';

/** Returns the document with the horizon's regional (image pixels, >= 2 points) in the scenario set, or removed when null. */
export function setRegional(doc: ProjectDoc, horizonId: string, pointsPx: ImagePx[] | null, scenarioId?: string): ProjectDoc {
  return updateScenario(doc, (s) => {
    const regionals = { ...s.regionals };
    if (pointsPx && pointsPx.length >= 2) regionals[horizonId] = pointsPx.map(([u, v]) => [u, v]);
    else if (horizonId in regionals) delete regionals[horizonId];
    else return s;
    return { ...s, regionals };
  }, scenarioId);
}

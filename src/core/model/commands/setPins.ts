import type { ImagePx, ProjectDoc } from '../projectDoc';
import { updateScenario } from './updateScenario';

/** Returns the document with the scenario's two pins (image-pixel points; each is the vertical section line through it) set or cleared. */
export function setPins(doc: ProjectDoc, pinsPx: [ImagePx, ImagePx] | null, scenarioId?: string): ProjectDoc {
  return updateScenario(doc, (s) => ({ ...s, pinsPx: pinsPx ? [[pinsPx[0][0], pinsPx[0][1]], [pinsPx[1][0], pinsPx[1][1]]] : null }), scenarioId);
}

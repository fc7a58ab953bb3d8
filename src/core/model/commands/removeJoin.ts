import type { ProjectDoc } from '../projectDoc';
import { updateHorizon } from './updateHorizon';

/** Returns the document with the horizon's cut at vertex `at` removed (the two pieces become one, the cutoffs joined straight); unchanged when there is no such cut. */
export function removeJoin(doc: ProjectDoc, horizonId: string, at: number): ProjectDoc {
  return updateHorizon(doc, horizonId, (h) => (h.joins.some((j) => j.at === at) ? { ...h, joins: h.joins.filter((j) => j.at !== at) } : h));
}

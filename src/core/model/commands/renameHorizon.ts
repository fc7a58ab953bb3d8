import { nameLengthProblem } from '../limits';
import type { ProjectDoc } from '../projectDoc';
import { horizonNameTaken } from './horizonNameTaken';
import { updateHorizon } from './updateHorizon';

/** Returns the document with the horizon renamed (trimmed); unchanged for an empty or identical name, one another horizon has, or one over the name length limit (nameLengthProblem says why). */
export function renameHorizon(doc: ProjectDoc, horizonId: string, name: string): ProjectDoc {
  const trimmed = name.trim();
  if (horizonNameTaken(doc, horizonId, trimmed) || nameLengthProblem(trimmed)) return doc;
  return updateHorizon(doc, horizonId, (h) => (trimmed === '' || trimmed === h.name ? h : { ...h, name: trimmed }));
}

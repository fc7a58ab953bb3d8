import type { ProjectDoc } from '../projectDoc';
import { updateHorizon } from './updateHorizon';

/** Returns the document with the horizon renamed (trimmed); unchanged for an empty or identical name. */
export function renameHorizon(doc: ProjectDoc, horizonId: string, name: string): ProjectDoc {
  const trimmed = name.trim();
  return updateHorizon(doc, horizonId, (h) => (trimmed === '' || trimmed === h.name ? h : { ...h, name: trimmed }));
}

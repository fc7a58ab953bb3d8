import type { ProjectDoc } from '../projectDoc';
import { faultNameTaken } from './addFault';
import { updateFault } from './updateFault';

/** Returns the document with the fault renamed (trimmed); unchanged for an empty or identical name, or one another fault has. Joins refer to the id, so they keep. */
export function renameFault(doc: ProjectDoc, faultId: string, name: string): ProjectDoc {
  const trimmed = name.trim();
  if (trimmed === '' || faultNameTaken(doc, faultId, trimmed)) return doc;
  return updateFault(doc, faultId, (f) => (trimmed === f.name ? f : { ...f, name: trimmed }));
}
